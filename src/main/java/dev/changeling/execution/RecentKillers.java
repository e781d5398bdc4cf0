package dev.changeling.execution;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.List;

/**
 * The tests that killed the last few mutants, tried first on the next ones. The plan lists mutants in the order of
 * their source, so a mutant's neighbours in the list are its neighbours in the code, and the test that killed one
 * often kills the next: tried first, it kills in the run's first step instead of a later, larger one. Only the order
 * changes: every test a mutant would run still runs until one fails, so the verdict is the same (bar a test that
 * fails or passes by the order tests run in, as it can between any two runs).
 */
final class RecentKillers {

    /** How many recent killers go first: enough for the few tests that kill most mutants of one method. */
    static final int KEPT = 3;

    private final Deque<String> killers = new ArrayDeque<>();

    /** The job with the recent killers among its tests first, most recent first; with every test to run, as it is. */
    synchronized MutantJob first(MutantJob job) {
        return job.everyTest() ? job : job.withFirst(List.copyOf(killers));
    }

    /** Notes the test that killed a mutant. */
    synchronized void note(JobResult result) {
        if (result.outcome() == Outcome.KILLED && result.testId() != null) {
            killers.remove(result.testId());
            killers.addFirst(result.testId());
            while (killers.size() > KEPT) {
                killers.removeLast();
            }
        }
    }
}
