/** What the results mean: mutation score per file, operator and order, with its Wilson interval when sampled. */
package dev.changeling.analysis;
