/** Mutation points, first-order and k-order mutants, their stable fingerprints, sampling and unified diffs. */
package dev.changeling.mutant;
