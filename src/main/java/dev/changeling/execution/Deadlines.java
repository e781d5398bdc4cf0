package dev.changeling.execution;

import java.util.List;

/**
 * How long a mutant's tests may run: {@code factor} times their baseline time plus {@code constantMillis}.
 *
 * @param factor         how many times slower than the baseline a run may be; at least 1
 * @param constantMillis added to every deadline, for costs that do not grow with the tests' own time
 */
public record Deadlines(double factor, long constantMillis) {

    /**
     * Factor 3: the baseline ran in one warm worker alone, while mutants share the cores with the other
     * workers and some run in a freshly started one that has not been through the JIT yet. Constant
     * 2 s: each test is discovered and run on its own, so it pays its class setup again, and a fresh
     * worker loads the engine and the test classes first; a garbage-collection pause must not turn into a
     * timeout either. Both lean long: a deadline set too short reports a false "timed out" (counted as
     * detected), while one set too long only costs time on the rare mutant that really loops.
     */
    public static final Deadlines DEFAULT = new Deadlines(3.0, 2_000);

    public Deadlines {
        if (!(factor >= 1) || Double.isInfinite(factor)) {
            throw new IllegalArgumentException("the deadline factor must be a number of at least 1, not " + factor);
        }
        if (constantMillis < 0) {
            throw new IllegalArgumentException("the deadline constant must not be negative, not " + constantMillis + " ms");
        }
    }

    /** The deadline for tests whose baseline times add up to {@code baselineNanos}. */
    public long millisFor(long baselineNanos) {
        return Math.max(1, constantMillis + (long) Math.ceil(factor * baselineNanos / 1_000_000.0));
    }

    /** The deadline for running these tests, from their baseline times. */
    public long millisFor(List<String> testIds, Baseline baseline) {
        return millisFor(baseline.nanosOf(testIds));
    }
}
