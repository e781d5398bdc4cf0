package dev.changeling.execution;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;

/**
 * One mutant to run: switch on its points, run its tests in the given order, stop at the first failure (or, for the
 * full kill matrix, run every one).
 * The worker runs the tests in steps (one request each); every step has its own deadline, from the
 * baseline times of the tests in it, so a mutant that loops in its first test is stopped after that
 * test's allowance, not after the allowance of every test that could have run.
 *
 * @param key          the caller's name for it (a fingerprint), handed back in the result
 * @param points       the mutation points to switch on
 * @param tests        JUnit unique ids, in the order to run them
 * @param testNanos    each test's time alone in the baseline, in the order of {@code tests}
 * @param deadlines    how a step's deadline follows from the baseline times of its tests
 * @param aloneClasses for a mutant compiled on its own: the folder of its classes, put first on the
 *                     classpath of a fresh worker used for this job only; null for schema mutants
 * @param everyTest    whether every test runs, whatever fails before it; otherwise the run stops after the step
 *                     (the group of tests run in one request) in which a test first fails
 */
public record MutantJob(String key, int[] points, List<String> tests, long[] testNanos, Deadlines deadlines, Path aloneClasses,
                        boolean everyTest) {

    public MutantJob {
        Objects.requireNonNull(key, "key");
        points = points.clone();
        tests = List.copyOf(tests);
        testNanos = testNanos.clone();
        Objects.requireNonNull(deadlines, "deadlines");
        if (testNanos.length != tests.size()) {
            throw new IllegalArgumentException(key + " has " + tests.size() + " tests but " + testNanos.length + " baseline times");
        }
    }

    /** A job that stops at the first failure. */
    public MutantJob(String key, int[] points, List<String> tests, long[] testNanos, Deadlines deadlines, Path aloneClasses) {
        this(key, points, tests, testNanos, deadlines, aloneClasses, false);
    }

    /** A mutant of the schema classes: it runs in a shared worker with its points switched on. */
    public static MutantJob schema(String key, int[] points, List<String> tests, Deadlines deadlines, Baseline baseline) {
        return new MutantJob(key, points, tests, baseline.aloneNanos(tests), deadlines, null);
    }

    /** A mutant compiled on its own into {@code classes}; it needs a fresh worker of its own. */
    public static MutantJob alone(String key, Path classes, List<String> tests, Deadlines deadlines, Baseline baseline) {
        return new MutantJob(key, new int[0], tests, baseline.aloneNanos(tests), deadlines, Objects.requireNonNull(classes, "classes"));
    }

    /** A schema mutant whose every step may take {@code stepMillis}, whatever its tests cost in the baseline. */
    public static MutantJob schema(String key, int[] points, List<String> tests, long stepMillis) {
        return new MutantJob(key, points, tests, new long[tests.size()], flat(stepMillis), null);
    }

    /** A mutant compiled alone whose every step may take {@code stepMillis}. */
    public static MutantJob alone(String key, Path classes, List<String> tests, long stepMillis) {
        return new MutantJob(key, new int[0], tests, new long[tests.size()], flat(stepMillis), Objects.requireNonNull(classes, "classes"));
    }

    /** The same job under other deadlines. */
    public MutantJob withDeadlines(Deadlines other) {
        return new MutantJob(key, points, tests, testNanos, other, aloneClasses, everyTest);
    }

    /** The tests after {@code test}, for a job stopped in place in it, under the deadlines of a resumed job. */
    public MutantJob resumedAfter(String test) {
        int at = tests.indexOf(test);
        return new MutantJob(key, points, tests.subList(at + 1, tests.size()),
                Arrays.copyOfRange(testNanos, at + 1, testNanos.length), deadlines.resumed(), aloneClasses, everyTest);
    }

    /** The same job with those of {@code first} that are among its tests moved to the front, in that order. */
    public MutantJob withFirst(List<String> first) {
        List<Integer> order = new ArrayList<>();
        boolean[] moved = new boolean[tests.size()];
        for (String test : first) {
            int at = tests.indexOf(test);
            if (at >= 0 && !moved[at]) {
                moved[at] = true;
                order.add(at);
            }
        }
        if (order.isEmpty() || order.size() == 1 && order.get(0) == 0) {
            return this;
        }
        for (int at = 0; at < tests.size(); at++) {
            if (!moved[at]) {
                order.add(at);
            }
        }
        return new MutantJob(key, points, order.stream().map(tests::get).toList(), order.stream().mapToLong(at -> testNanos[at]).toArray(),
                deadlines, aloneClasses, everyTest);
    }

    /** The same job running every one of its tests, not stopping at the first failure. */
    public MutantJob runningEveryTest() {
        return new MutantJob(key, points, tests, testNanos, deadlines, aloneClasses, true);
    }

    /** The deadline for the step that runs {@code count} tests from index {@code from} on. */
    public long stepMillis(int from, int count, boolean firstRunOfAClass) {
        long nanos = 0;
        for (int i = Math.max(0, from); i < Math.min(testNanos.length, from + count); i++) {
            nanos += testNanos[i];
        }
        return deadlines.millisFor(nanos, firstRunOfAClass);
    }

    @Override
    public int[] points() {
        return points.clone();
    }

    @Override
    public long[] testNanos() {
        return testNanos.clone();
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof MutantJob job && key.equals(job.key) && Arrays.equals(points, job.points)
                && tests.equals(job.tests) && Arrays.equals(testNanos, job.testNanos) && deadlines.equals(job.deadlines)
                && Objects.equals(aloneClasses, job.aloneClasses) && everyTest == job.everyTest;
    }

    @Override
    public int hashCode() {
        return Objects.hash(key, Arrays.hashCode(points), tests, Arrays.hashCode(testNanos), deadlines, aloneClasses, everyTest);
    }

    @Override
    public String toString() {
        return "MutantJob[" + key + ", points " + Arrays.toString(points) + ", " + tests.size() + " tests, "
                + deadlines + (aloneClasses == null ? "" : ", alone in " + aloneClasses) + (everyTest ? ", every test" : "") + "]";
    }

    private static Deadlines flat(long stepMillis) {
        if (stepMillis <= 0) {
            throw new IllegalArgumentException("a step's deadline must be positive, not " + stepMillis + " ms");
        }
        return new Deadlines(1, stepMillis);
    }
}
