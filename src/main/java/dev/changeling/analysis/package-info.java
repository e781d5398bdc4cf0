/** What the results mean: mutation score and its interval, kill matrix, test redundancy, higher-order coupling. */
package dev.changeling.analysis;
