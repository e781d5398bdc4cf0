package dev.changeling.execution;

/**
 * How long a step of a mutant's tests may run: {@code factor} times their baseline time plus
 * {@code constantMillis}, and {@code firstRunExtraMillis} more when the step is the first in its worker
 * to run a test of some class.
 *
 * @param factor              how many times slower than the baseline a run may be; at least 1
 * @param constantMillis      added to every deadline, for costs that do not grow with the tests' own time
 * @param firstRunExtraMillis added for a step that runs a test class its worker has not run before
 */
public record Deadlines(double factor, long constantMillis, long firstRunExtraMillis) {

    /**
     * Factor 3: the baseline ran with the cores to itself or nearly, while mutants share them with the other
     * workers (and, on a build server, with other jobs). Constant 300 ms: a deadline now stops a looping mutant in
     * place instead of costing a fresh worker, so it can be short, as long as it stays long enough for every
     * mutant that ends by itself. Measured with {@code run --recheck-timeouts} (every timed-out mutant again with
     * ten times its deadline) on commons-cli's full run: at 300 ms, 56 timeouts and not one that then finished;
     * at the former 1 s, 6 of 57 finished (failing) after 6–12 s, the verdicts being the same otherwise. At 150 ms,
     * commons-cli again had none, but commons-collections4 ({@code --sample 400 --seed 1}) had 1 of 10 (a mutant that
     * failed after 518 ms), against 0 of 8 at 300 ms. A deadline set
     * too short reports a false "timed out", counted as detected, which could hide a survivor; one set too long
     * costs its length on every mutant that really loops.
     */
    public static final Deadlines DEFAULT = new Deadlines(3.0, 300);

    /**
     * The first run of a test class in a worker loads it and everything it uses, and the engine and the JIT
     * see it for the first time: such steps took up to 0.4 s more than their allowance in the same run.
     * Every fresh worker meets all the classes again, so this is not rare; it is kept apart from the
     * constant so that a mutant looping in a class the worker knows is stopped soon.
     */
    public static final long FIRST_RUN_EXTRA_MILLIS = 2_000;

    /**
     * The constant of a job resumed after one of its tests was stopped in place, at most: the mutant is known to loop
     * somewhere, so a later test gets little more than its own baseline time to fail normally, and no extra for a
     * class its worker meets for the first time. A later test stopped too soon costs nothing in trust: the mutant
     * merely stays timed out, as it was.
     */
    public static final long RESUMED_CONSTANT_MILLIS = 50;

    /** Deadlines with {@link #FIRST_RUN_EXTRA_MILLIS} for a worker's first run of a test class. */
    public Deadlines(double factor, long constantMillis) {
        this(factor, constantMillis, FIRST_RUN_EXTRA_MILLIS);
    }

    public Deadlines {
        if (!(factor >= 1) || Double.isInfinite(factor)) {
            throw new IllegalArgumentException("the deadline factor must be a number of at least 1, not " + factor);
        }
        if (firstRunExtraMillis < 0) {
            throw new IllegalArgumentException("the extra for a first run must not be negative, not " + firstRunExtraMillis + " ms");
        }
        if (constantMillis < 0) {
            throw new IllegalArgumentException("the deadline constant must not be negative, not " + constantMillis + " ms");
        }
    }

    /**
     * The deadlines of a job resumed after a stop: the same factor, a constant of at most
     * {@link #RESUMED_CONSTANT_MILLIS}, no extra for a first run of a class.
     */
    public Deadlines resumed() {
        return new Deadlines(factor, Math.min(constantMillis, RESUMED_CONSTANT_MILLIS), 0);
    }

    /** The deadline for tests whose baseline times add up to {@code baselineNanos}. */
    public long millisFor(long baselineNanos) {
        return Math.max(1, constantMillis + (long) Math.ceil(factor * baselineNanos / 1_000_000.0));
    }

    /** The deadline for a step, with the extra for one that runs a test class its worker has not run before. */
    public long millisFor(long baselineNanos, boolean firstRunOfAClass) {
        return millisFor(baselineNanos) + (firstRunOfAClass ? firstRunExtraMillis : 0);
    }
}
