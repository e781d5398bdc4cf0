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
     * Factor 3: the baseline ran in one worker alone, while mutants share the cores with the other
     * workers (and, on a build server, with other jobs). Constant 3 s: the first mutant in a fresh
     * worker loads the test classes and runs them before the JIT has caught up — measured at 0.3–0.8 s
     * for one trivial test on a busy 2-core machine — and a garbage-collection pause must not become a
     * timeout either. Both lean long on purpose: a deadline set too short reports a false "timed out",
     * counted as detected, which hides a survivor; one set too long only costs time on the rare mutant
     * that really loops.
     */
    public static final Deadlines DEFAULT = new Deadlines(3.0, 3_000);

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

    /** The deadline for running these tests one at a time, from what each cost alone in the baseline. */
    public long millisFor(List<String> testIds, Baseline baseline) {
        return millisFor(baseline.nanosOf(testIds));
    }
}
