package dev.changeling.execution;

/**
 * How long a step of a mutant's tests may run: {@code factor} times their baseline time plus
 * {@code constantMillis}, and {@link #FIRST_RUN_EXTRA_MILLIS} more when the step is the first in its worker
 * to run a test of some class.
 *
 * @param factor         how many times slower than the baseline a run may be; at least 1
 * @param constantMillis added to every deadline, for costs that do not grow with the tests' own time
 */
public record Deadlines(double factor, long constantMillis) {

    /**
     * Factor 3: the baseline ran in one worker alone, while mutants share the cores with the other
     * workers (and, on a build server, with other jobs). Constant 1 s: over the 4,556 steps of a full run
     * of commons-cli's mutants, a step whose test classes its worker had run before took at most 55 ms
     * longer than three times its baseline time, once 429 ms. Both lean long on purpose: a deadline set
     * too short reports a false "timed out", counted as detected, which hides a survivor; one set too long
     * costs its length on every mutant that really loops, and a worker's restart after it.
     */
    public static final Deadlines DEFAULT = new Deadlines(3.0, 1_000);

    /**
     * The first run of a test class in a worker loads it and everything it uses, and the engine and the JIT
     * see it for the first time: such steps took up to 0.4 s more than their allowance in the same run.
     * Every fresh worker meets all the classes again, so this is not rare; it is kept apart from the
     * constant so that a mutant looping in a class the worker knows is stopped soon.
     */
    public static final long FIRST_RUN_EXTRA_MILLIS = 2_000;

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

    /** The deadline for a step, with the extra for one that runs a test class its worker has not run before. */
    public long millisFor(long baselineNanos, boolean firstRunOfAClass) {
        return millisFor(baselineNanos) + (firstRunOfAClass ? FIRST_RUN_EXTRA_MILLIS : 0);
    }
}
