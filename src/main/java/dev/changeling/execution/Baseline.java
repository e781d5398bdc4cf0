package dev.changeling.execution;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.BitSet;
import java.util.Collection;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The unmutated suite's run: every test with its time and reach, the containers that failed, and what
 * happened while the production classes were initialised before any test.
 */
public final class Baseline {

    private final List<RecordedTest> tests;
    private final List<FailedContainer> failedContainers;
    private final int[] reachedWhileInitialising;
    private final List<String> initialisationFailures;
    private final long nanos;
    private final List<String> classesRunInFreshWorkers;
    private final Set<String> tagsThatLeftOutTests;
    private final Map<String, RecordedTest> byId = new LinkedHashMap<>();
    private final Map<Integer, BitSet> testsByPoint = new HashMap<>();

    /**
     * @param tests                    in the order they finished
     * @param failedContainers         containers whose setup or teardown failed
     * @param reachedWhileInitialising points reached while the classes named for pre-initialisation were
     *                                 initialised: static initialiser code that runs once per JVM
     * @param initialisationFailures   one line per such class that could not be initialised
     * @param nanos                    wall time of the whole suite
     */
    public Baseline(List<RecordedTest> tests, List<FailedContainer> failedContainers,
                    int[] reachedWhileInitialising, List<String> initialisationFailures, long nanos) {
        this(tests, failedContainers, reachedWhileInitialising, initialisationFailures, nanos, List.of(), Set.of());
    }

    private Baseline(List<RecordedTest> tests, List<FailedContainer> failedContainers, int[] reachedWhileInitialising,
                     List<String> initialisationFailures, long nanos, List<String> classesRunInFreshWorkers,
                     Set<String> tagsThatLeftOutTests) {
        this.classesRunInFreshWorkers = List.copyOf(classesRunInFreshWorkers);
        this.tagsThatLeftOutTests = Set.copyOf(tagsThatLeftOutTests);
        this.tests = List.copyOf(tests);
        this.failedContainers = List.copyOf(failedContainers);
        this.reachedWhileInitialising = reachedWhileInitialising.clone();
        Arrays.sort(this.reachedWhileInitialising);
        this.initialisationFailures = List.copyOf(initialisationFailures);
        this.nanos = nanos;
        for (int index = 0; index < this.tests.size(); index++) {
            RecordedTest test = this.tests.get(index);
            byId.put(test.id(), test);
            for (int point : test.reached()) {
                testsByPoint.computeIfAbsent(point, p -> new BitSet()).set(index);
            }
        }
    }

    /**
     * The runs of parts of the suite (a test class each, say) as one; what initialising the classes reached is
     * the same in every worker, and the first part's is kept.
     *
     * @param nanos                    wall time of all the parts
     * @param classesRunInFreshWorkers test classes whose part ran in a worker of its own
     */
    static Baseline merge(List<Baseline> parts, long nanos, List<String> classesRunInFreshWorkers) {
        List<RecordedTest> tests = new ArrayList<>();
        List<FailedContainer> containers = new ArrayList<>();
        Set<String> tags = new HashSet<>();
        parts.forEach(part -> {
            tests.addAll(part.tests);
            containers.addAll(part.failedContainers);
            tags.addAll(part.tagsThatLeftOutTests);
        });
        int[] reached = parts.isEmpty() ? new int[0] : parts.get(0).reachedWhileInitialising;
        List<String> failures = parts.isEmpty() ? List.of() : parts.get(0).initialisationFailures;
        return new Baseline(tests, containers, reached, failures, nanos, classesRunInFreshWorkers, tags);
    }

    /** The same run with more tests, whose reach and times were recorded earlier (a reach map's). */
    public Baseline with(List<RecordedTest> recorded) {
        List<RecordedTest> all = new ArrayList<>(tests);
        all.addAll(recorded);
        return new Baseline(all, failedContainers, reachedWhileInitialising, initialisationFailures, nanos,
                classesRunInFreshWorkers, tagsThatLeftOutTests);
    }

    /** The same run, with the excluded tag expressions that left out at least one test (the worker says which). */
    Baseline withTagsThatLeftOutTests(Collection<String> tags) {
        return new Baseline(tests, failedContainers, reachedWhileInitialising, initialisationFailures, nanos,
                classesRunInFreshWorkers, Set.copyOf(tags));
    }

    /**
     * The excluded tag expressions (the build's and {@code --skip-tag}'s) that left out at least one test; an
     * expression missing here matched no test of the classes that ran.
     */
    public Set<String> tagsThatLeftOutTests() {
        return tagsThatLeftOutTests;
    }

    /** Test classes that ran in a worker of their own, as the build runs every class in a fresh JVM. */
    public List<String> classesRunInFreshWorkers() {
        return classesRunInFreshWorkers;
    }

    public List<RecordedTest> tests() {
        return tests;
    }

    public List<FailedContainer> failedContainers() {
        return failedContainers;
    }

    /** Points reached while the pre-initialised classes were initialised, ascending. */
    public int[] reachedWhileInitialising() {
        return reachedWhileInitialising.clone();
    }

    public List<String> initialisationFailures() {
        return initialisationFailures;
    }

    public long nanos() {
        return nanos;
    }

    /** Whether no test and no container failed. */
    public boolean green() {
        return failedContainers.isEmpty() && failures().isEmpty();
    }

    public List<RecordedTest> failures() {
        return tests.stream().filter(test -> test.status() == TestStatus.FAILED).toList();
    }

    /** The test with that unique id, or null. */
    public RecordedTest test(String id) {
        return byId.get(id);
    }

    /**
     * The passing tests that reach any of the points, cheapest to run alone first (ties by id), the order
     * that tends to find a killing test soonest.
     */
    public List<String> testsFor(int... points) {
        BitSet reaching = new BitSet();
        for (int point : points) {
            BitSet tests = testsByPoint.get(point);
            if (tests != null) {
                reaching.or(tests);
            }
        }
        List<RecordedTest> passing = new ArrayList<>();
        reaching.stream().mapToObj(tests::get).filter(test -> test.status() == TestStatus.PASSED).forEach(passing::add);
        passing.sort(Comparator.comparingLong(RecordedTest::aloneNanos).thenComparing(RecordedTest::id));
        return passing.stream().map(RecordedTest::id).toList();
    }

    /** Each test's time alone, in the order given; 0 for an id the baseline does not know. */
    public long[] aloneNanos(List<String> testIds) {
        long[] nanos = new long[testIds.size()];
        for (int i = 0; i < nanos.length; i++) {
            RecordedTest test = byId.get(testIds.get(i));
            nanos[i] = test == null ? 0 : test.aloneNanos();
        }
        return nanos;
    }

    @Override
    public String toString() {
        return "Baseline[" + tests.size() + " tests, " + failures().size() + " failed, "
                + failedContainers.size() + " failed containers, " + nanos / 1_000_000 + " ms]";
    }
}
