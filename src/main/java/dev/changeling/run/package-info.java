/**
 * One mutation run end to end, as named phases: discover the project, generate and narrow the mutants,
 * compile them, take the baseline, execute the mutants, record the results file. {@code RunRequest} is the
 * complete request, kept in the results file so that {@code Rerun} can run one mutant again the same way.
 */
package dev.changeling.run;
