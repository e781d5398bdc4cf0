package dev.changeling.recall;

import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.changeling.AtomicFiles;
import dev.changeling.Text;
import dev.changeling.execution.Baseline;
import dev.changeling.execution.RecordedTest;
import dev.changeling.execution.TestStatus;
import dev.changeling.mutant.Point;
import dev.changeling.source.SourceHash;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.function.Consumer;
import java.util.stream.IntStream;

/**
 * Which tests reach which mutation points, from the baseline of a run that made every point of the project: kept so
 * that a later run (a review's, scoped to a change) runs only the test classes whose reach can have changed, as
 * class-level regression test selection does. A test class runs again when it is new or changed (it, or a test class it
 * names), or when a test of it reached a main file that changed; every other test's reach and time are the map's. The
 * map holds every main file's classes by digest, so a change anywhere is seen; where it cannot tell which tests a change
 * touches (a changed file that had no points, other surroundings, points it does not hold) the whole suite runs, and the
 * run says why. Documented in {@code docs/reach-map.md}.
 */
public final class ReachMap {

    public static final int FORMAT = 1;
    public static final String FILE_NAME = "reach-map.json";

    private static final ObjectMapper JSON = new ObjectMapper()
            .disable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES);

    /**
     * The file's layout.
     *
     * @param surroundings what the tests ran with (tool build, Java, classpath, test settings, operators), as a digest
     * @param points       the mapped points' fingerprints; a point's number in the map is its index
     * @param files        every main source (by package path) with the digest of its classes and its points' numbers
     * @param testClasses  every top-level test class (internal name) with the digest of it and the test classes it names
     * @param tests        every test of the baseline, reach as point numbers
     */
    record Contents(int format, String surroundings, List<String> points, Map<String, MappedFile> files,
                    Map<String, String> testClasses, List<MappedTest> tests) {
    }

    record MappedFile(String classes, int[] points) {
    }

    record MappedTest(String id, String name, String className, TestStatus status, String message, long nanos, long aloneNanos,
                      int[] reached, int[] infected) {
    }

    /**
     * What the baseline runs.
     *
     * @param runs    the top-level test classes (binary names) to run; null for every one
     * @param mapped  the tests whose reach and time come from the map, in the run's point ids
     * @param summary what was decided, in a line for the user
     */
    public record Choice(Set<String> runs, List<RecordedTest> mapped, String summary) {

        /** Whether the baseline runs this test class (top-level, binary name). */
        public boolean runs(String testClass) {
            return runs == null || runs.contains(testClass);
        }
    }

    private ReachMap() {
    }

    /**
     * Chooses the baseline's test classes with the map in {@code file}; when there is none, or it cannot say, every class.
     *
     * @param generation how points are made (operators and their settings), in words
     * @param points     the schema's points, by id
     * @param suite      the suite's test classes (binary names)
     */
    public static Choice choose(Path file, ProjectClasses classes, String generation, List<Point> points, List<String> suite) {
        if (!Files.isRegularFile(file)) {
            return whole("no reach map yet (" + file.getFileName() + ")");
        }
        Contents map;
        try {
            map = JSON.readValue(file.toFile(), Contents.class);
        } catch (IOException | RuntimeException e) {
            return whole(file + ": cannot read it (" + Text.firstLine(String.valueOf(e.getMessage())) + "); set aside");
        }
        if (map.format() != FORMAT || map.points() == null || map.files() == null || map.testClasses() == null || map.tests() == null) {
            return whole(file + ": not a reach map of this version (format " + map.format() + ", not " + FORMAT + ")");
        }
        if (!map.surroundings().equals(surroundings(classes, generation))) {
            return whole("the reach map was made with another build of the tool, Java, classpath, test settings or operators");
        }
        ClassGraph main = classes.main();
        Set<String> sources = new TreeSet<>(main.sources());
        sources.addAll(map.files().keySet());
        Set<Integer> changedPoints = new HashSet<>();
        Set<String> changedFiles = new TreeSet<>();
        for (String source : sources) {
            MappedFile mapped = map.files().get(source);
            if (mapped == null) {
                continue; // a new file: only changed code or a new test can reach it, and both are chosen
            }
            if (!mapped.classes().equals(main.digestOf(main.classesOfSource(source)))) {
                if (mapped.points().length == 0) {
                    return whole(source + " changed and had no points in the reach map, so which tests run it is unknown");
                }
                changedFiles.add(source);
                IntStream.of(mapped.points()).forEach(changedPoints::add);
            }
        }
        Set<String> mapPoints = new HashSet<>(map.points());
        for (Point point : points) {
            String source = main.sourceOf(point.file());
            if (source != null && !changedFiles.contains(source) && !mapPoints.contains(point.fingerprint())) {
                return whole("the reach map does not hold every point of " + source + " (made by a narrower run?)");
            }
        }
        Map<String, List<MappedTest>> byClass = new TreeMap<>();
        for (MappedTest test : map.tests()) {
            if (test.className() == null) {
                return whole("the reach map has a test of unknown class (" + test.name() + ")");
            }
            byClass.computeIfAbsent(ProjectClasses.topLevel(test.className()).replace('/', '.'), name -> new ArrayList<>()).add(test);
        }
        Set<String> runs = new TreeSet<>();
        List<MappedTest> reused = new ArrayList<>();
        Set<String> suiteClasses = new TreeSet<>();
        suite.forEach(name -> suiteClasses.add(ProjectClasses.topLevel(name).replace('/', '.')));
        for (String testClass : suiteClasses) {
            String internal = testClass.replace('.', '/');
            List<MappedTest> tests = byClass.getOrDefault(testClass, List.of());
            boolean same = classes.testClassDigest(testClass).equals(map.testClasses().get(internal));
            boolean touched = tests.stream().anyMatch(test -> IntStream.of(test.reached()).anyMatch(changedPoints::contains));
            if (!same || touched || tests.isEmpty()) {
                runs.add(testClass);
            } else {
                reused.addAll(tests);
            }
        }
        int[] ids = idsOf(map.points(), points);
        List<RecordedTest> mapped = reused.stream().map(test -> recorded(test, ids, points.size())).toList();
        return new Choice(runs, mapped, "reach map: " + runs.size() + " of " + suiteClasses.size() + " test classes run (new, changed,"
                + " or reaching " + changedFiles.size() + (changedFiles.size() == 1 ? " changed file" : " changed files") + "); the reach of "
                + mapped.size() + " tests comes from the map");
    }

    private static Choice whole(String why) {
        return new Choice(null, List.of(), why + ": the whole suite runs");
    }

    /** For each map number, the point's id in this run's schema, or -1 where the schema does not have it. */
    private static int[] idsOf(List<String> mapPoints, List<Point> points) {
        Map<String, Integer> ids = new HashMap<>();
        for (int id = 0; id < points.size(); id++) {
            ids.put(points.get(id).fingerprint(), id);
        }
        return mapPoints.stream().mapToInt(fingerprint -> ids.getOrDefault(fingerprint, -1)).toArray();
    }

    private static RecordedTest recorded(MappedTest test, int[] ids, int pointCount) {
        IntStream reached = IntStream.of(test.reached()).map(number -> ids[number]).filter(id -> id >= 0);
        IntStream infected = IntStream.of(test.infected()).map(number -> ids[number]).filter(id -> id >= 0).map(id -> id + pointCount);
        return new RecordedTest(test.id(), test.name(), test.className(), test.status(), test.message(), test.nanos(),
                test.aloneNanos(), IntStream.concat(reached, infected).toArray());
    }

    /**
     * Writes the map of a baseline that ran with every point of the project in its schema.
     *
     * @throws IOException when the file cannot be written
     */
    public static void write(Path file, ProjectClasses classes, String generation, List<Point> points, Baseline baseline)
            throws IOException {
        ClassGraph main = classes.main();
        Map<String, List<Integer>> pointsBySource = new TreeMap<>();
        main.sources().forEach(source -> pointsBySource.put(source, new ArrayList<>()));
        for (int id = 0; id < points.size(); id++) {
            String source = main.sourceOf(points.get(id).file());
            if (source != null) {
                pointsBySource.get(source).add(id);
            }
        }
        Map<String, MappedFile> files = new TreeMap<>();
        pointsBySource.forEach((source, ids) -> files.put(source, new MappedFile(main.digestOf(main.classesOfSource(source)),
                ids.stream().mapToInt(Integer::intValue).toArray())));
        Map<String, String> testClasses = new TreeMap<>();
        List<MappedTest> tests = new ArrayList<>();
        for (RecordedTest test : baseline.tests()) {
            if (test.className() != null) {
                String owner = ProjectClasses.topLevel(test.className());
                testClasses.computeIfAbsent(owner, name -> classes.testClassDigest(name.replace('/', '.')));
            }
            int[] reached = test.reached();
            tests.add(new MappedTest(test.id(), test.name(), test.className(), test.status(), test.message(), test.nanos(),
                    test.aloneNanos(), IntStream.of(reached).filter(id -> id < points.size()).toArray(),
                    IntStream.of(reached).filter(id -> id >= points.size()).map(id -> id - points.size()).toArray()));
        }
        Contents contents = new Contents(FORMAT, surroundings(classes, generation), points.stream().map(Point::fingerprint).toList(),
                files, testClasses, tests);
        Files.createDirectories(file.getParent());
        AtomicFiles.write(file, out -> JSON.writeValue(out, contents));
    }

    private static String surroundings(ProjectClasses classes, String generation) {
        return SourceHash.sha256(classes.surroundings() + "\npoints made by " + generation + "\n");
    }

    /** A notice for a map that could not be written; the run does not depend on it. */
    public static String unwritten(Path file, Exception e) {
        return file + ": could not write the reach map (" + Text.firstLine(String.valueOf(e.getMessage())) + ")";
    }
}
