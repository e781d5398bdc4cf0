/**
 * One mutation run end to end, as named phases: discover the project, generate and narrow the mutants,
 * compile the schema, take the baseline, compile the mutants that cannot join the schema, execute, record the
 * results file. {@code RunInput} is what the user typed and {@code RunRequest} the complete request it resolves to,
 * kept in the results file so that {@code Rerun} can run one mutant again the same way.
 */
package dev.changeling.run;
