package dev.changeling.execution;

/**
 * One test run against a mutant.
 *
 * @param testId  the JUnit unique id
 * @param status  how it ended
 * @param nanos   wall time of its run in the worker, discovery of the one test included
 * @param message why it failed, was aborted or skipped; null when it passed
 */
public record TestRun(String testId, TestStatus status, long nanos, String message) {
}
