package dev.changeling.execution;

import java.util.List;

/**
 * What became of one mutant job.
 *
 * @param key      the job's key, as given
 * @param outcome  what the run came to
 * @param testId   the test that failed (killed), or that was running at the deadline (timed out) or
 *                 when the worker died (crashed); null when it survived
 * @param message  the failure's short message, or what happened to the worker; null when it survived, unless its
 *                 first worker died and the verdict comes from a second run in a fresh one ({@link CrashCheck})
 * @param testsRun the tests that finished, in the order they ran (the one running at a timeout or
 *                 crash is not among them)
 * @param nanos    wall time from sending the job to its answer
 */
public record JobResult(String key, Outcome outcome, String testId, String message, List<TestRun> testsRun, long nanos) {

    public JobResult {
        testsRun = List.copyOf(testsRun);
    }
}
