/**
 * Verdicts of earlier runs, kept by content: a mutant whose code, tests, their dependencies and the run's settings are
 * what they were when its verdict was found gets that verdict again without running.
 */
package dev.changeling.recall;
