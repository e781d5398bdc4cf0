/** One mutation run end to end: from the project folder to the results file. */
package dev.changeling.run;
