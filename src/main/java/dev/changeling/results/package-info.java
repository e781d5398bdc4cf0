/** The results file, the single source every view reads. */
package dev.changeling.results;
