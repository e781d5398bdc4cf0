package dev.changeling.execution;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;

/**
 * What became of one mutant job.
 *
 * @param key      the job's key, as given
 * @param outcome  what the run came to
 * @param testId   the first test that failed (killed), or the test that was running at the deadline (timed out) or
 *                 when the worker died (crashed); null when it survived
 * @param message  the failure's short message, or what happened to the worker; null when it survived, unless its
 *                 first worker died and the verdict comes from a second run in a fresh one ({@link CrashCheck})
 * @param testsRun the tests that finished, in the order they ran (the one running at a timeout or
 *                 crash is not among them)
 * @param nanos    wall time from sending the job to its answer
 * @param entered  the schema methods the mutant's run entered (with those its worker entered while initialising the
 *                 production classes), by id; null when the worker did not say, because it was ended or died
 */
public record JobResult(String key, Outcome outcome, String testId, String message, List<TestRun> testsRun, long nanos,
                        BitSet entered) {

    public JobResult {
        testsRun = List.copyOf(testsRun);
        entered = entered == null ? null : (BitSet) entered.clone();
    }

    /** A result whose worker did not say which methods it entered. */
    public JobResult(String key, Outcome outcome, String testId, String message, List<TestRun> testsRun, long nanos) {
        this(key, outcome, testId, message, testsRun, nanos, null);
    }

    /** The methods a run entered, as the worker lists them. */
    static BitSet entered(int[] ids) {
        BitSet methods = new BitSet();
        for (int id : ids) {
            methods.set(id);
        }
        return methods;
    }

    /**
     * The tests that failed, in the order they ran: the one killer of a run that stopped at the first failure; with
     * every test run, all of them, those that failed before a timeout or a crash included (a test stopped at its
     * deadline is not among them).
     */
    /**
     * With every test run, a mutant can fail a test and then time out or crash in a later one; a run that stopped at the
     * first failure would never have reached the later test, so the failure decides: killed by it, the detail saying
     * how the run then ended. Any other result stays as it is.
     */
    JobResult decidedByAnEarlierFailure() {
        if (outcome != Outcome.TIMED_OUT && outcome != Outcome.CRASHED) {
            return this;
        }
        return testsRun.stream()
                .filter(test -> test.status() == TestStatus.FAILED)
                .findFirst()
                .map(first -> new JobResult(key, Outcome.KILLED, first.testId(), first.message()
                        + "; a later test then ended the run: " + message, testsRun, nanos, entered))
                .orElse(this);
    }

    /**
     * This result, of a job stopped in place, followed by {@code more}, of its tests after the stopped one: killed when
     * one of those failed, else still timed out as it was; the tests, the time and the entered methods of both.
     */
    JobResult resumedWith(JobResult more) {
        List<TestRun> all = new ArrayList<>(testsRun);
        all.addAll(more.testsRun);
        long total = nanos + more.nanos;
        BitSet both = null;
        if (entered != null && more.entered != null) {
            both = (BitSet) entered.clone();
            both.or(more.entered);
        }
        if (more.outcome == Outcome.KILLED) {
            return new JobResult(key, Outcome.KILLED, more.testId, more.message + " (an earlier test, stopped at its deadline, "
                    + "did not decide: " + message + ")", all, total, both);
        }
        return new JobResult(key, outcome, testId, message, all, total, both);
    }

    /** Every test stopped in place at its step's deadline, in the order they ran. */
    List<String> stoppedTests() {
        return testsRun.stream().filter(test -> test.status() == TestStatus.STOPPED).map(TestRun::testId).toList();
    }

    /** The test stopped in place at its step's deadline, or null when none was. */
    String stoppedTest() {
        return stoppedTests().stream().findFirst().orElse(null);
    }

    public List<String> failedTests() {
        return testsRun.stream().filter(test -> test.status() == TestStatus.FAILED).map(TestRun::testId).toList();
    }
}
