/**
 * What the results mean: mutation score per file, operator and order (with its Wilson interval when sampled), line
 * coverage beside it, and what the kill matrix shows (tests' kills, a greedy subset, subsumption, weak tests, coupling);
 * all computed from the results file, nothing run again.
 */
package dev.changeling.analysis;
