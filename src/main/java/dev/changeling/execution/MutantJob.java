package dev.changeling.execution;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;

/**
 * One mutant to run: switch on its points, run its tests one at a time in the given order, stop at
 * the first failure.
 *
 * @param key            the caller's name for it (a fingerprint), handed back in the result
 * @param points         the mutation points to switch on
 * @param tests          JUnit unique ids, in the order to run them
 * @param deadlineMillis how long the tests may take together before the worker is killed
 * @param aloneClasses   for a mutant compiled on its own: the folder of its classes, put first on the
 *                       classpath of a fresh worker used for this job only; null for schema mutants
 */
public record MutantJob(String key, int[] points, List<String> tests, long deadlineMillis, Path aloneClasses) {

    public MutantJob {
        Objects.requireNonNull(key, "key");
        points = points.clone();
        tests = List.copyOf(tests);
        if (deadlineMillis <= 0) {
            throw new IllegalArgumentException("the deadline of " + key + " must be positive, not " + deadlineMillis);
        }
    }

    /** A mutant of the schema classes: it runs in a shared worker with its points switched on. */
    public static MutantJob schema(String key, int[] points, List<String> tests, long deadlineMillis) {
        return new MutantJob(key, points, tests, deadlineMillis, null);
    }

    /** A mutant compiled on its own into {@code classes}; it needs a fresh worker of its own. */
    public static MutantJob alone(String key, Path classes, int[] points, List<String> tests, long deadlineMillis) {
        return new MutantJob(key, points, tests, deadlineMillis, Objects.requireNonNull(classes, "classes"));
    }

    @Override
    public int[] points() {
        return points.clone();
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof MutantJob job && key.equals(job.key) && Arrays.equals(points, job.points)
                && tests.equals(job.tests) && deadlineMillis == job.deadlineMillis && Objects.equals(aloneClasses, job.aloneClasses);
    }

    @Override
    public int hashCode() {
        return Objects.hash(key, Arrays.hashCode(points), tests, deadlineMillis, aloneClasses);
    }

    @Override
    public String toString() {
        return "MutantJob[" + key + ", points " + Arrays.toString(points) + ", " + tests.size() + " tests, "
                + deadlineMillis + " ms" + (aloneClasses == null ? "" : ", alone in " + aloneClasses) + "]";
    }
}
