package dev.changeling.recall;

import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.changeling.AtomicFiles;
import dev.changeling.Text;
import dev.changeling.execution.Baseline;
import dev.changeling.execution.RecordedTest;
import dev.changeling.execution.TestStatus;
import dev.changeling.mutant.EntryMethods.EntryMethod;
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
import java.util.Objects;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.stream.IntStream;

/**
 * Which tests reach which mutation points and enter which methods, from the baseline of a run that made every point of
 * the project: kept so that a later run (a review's, scoped to a change) runs only the test classes whose reach can have
 * changed, as class-level regression test selection does. A test class runs again when it is new or changed (it, or a
 * test class it names), or when a test of it ran changed code of a main file: a changed method it entered, when only the
 * bodies of noted methods changed ({@link SchemaCode}), else any point of the file. Every other test's reach and time
 * are the map's. The map holds every main file's classes by digest, so a change anywhere is seen; where it cannot tell
 * which tests a change touches (a changed file that had no points, a changed method that ran while the classes were
 * initialised, other surroundings, points it does not hold) the whole suite runs, and the run says why. Documented in
 * {@code docs/re-runs.md}.
 */
public final class ReachMap {

    public static final int FORMAT = 2;
    public static final String FILE_NAME = "reach-map.json";

    private static final ObjectMapper JSON = new ObjectMapper()
            .disable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES);

    /**
     * The file's layout.
     *
     * @param surroundings what the tests ran with (tool build, Java, classpath, test settings, operators), as a digest
     * @param points       the mapped points' fingerprints; a point's number in the map is its index
     * @param methods      the noted methods' names; a method's number in the map is its index
     * @param initialising the methods entered while the production classes were initialised, by number
     * @param files        every main source (by package path) with the digest of its classes and its points' numbers
     * @param testClasses  every top-level test class (internal name) with the digest of it and the test classes it names
     * @param tests        every test of the baseline, reach as point numbers, entries as method numbers
     */
    record Contents(int format, String surroundings, List<String> points, List<String> methods, int[] initialising,
                    Map<String, MappedFile> files, Map<String, String> testClasses, List<MappedTest> tests) {
    }

    /**
     * A main source: the digest of its classes and its points' numbers; for a file of the schema, also the digest of its
     * skeleton and of each noted method's body, by name (else null).
     */
    record MappedFile(String classes, int[] points, String skeleton, Map<String, String> bodies) {
    }

    record MappedTest(String id, String name, String className, TestStatus status, String message, long nanos, long aloneNanos,
                      int[] reached, int[] infected, int[] entered) {
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
     * @param schema     the schema's points and noted methods, by id, with their files
     * @param suite      the suite's test classes (binary names)
     */
    public static Choice choose(Path file, ProjectClasses classes, String generation, SchemaCode schema, List<String> suite) {
        List<Point> points = schema.points();
        if (!Files.isRegularFile(file)) {
            return whole("no reach map yet (" + file.getFileName() + ")");
        }
        Contents map;
        try {
            map = JSON.readValue(file.toFile(), Contents.class);
        } catch (IOException | RuntimeException e) {
            return whole(file + ": cannot read it (" + Text.firstLine(String.valueOf(e.getMessage())) + "); set aside");
        }
        if (map.format() != FORMAT || map.points() == null || map.methods() == null || map.initialising() == null
                || map.files() == null || map.testClasses() == null || map.tests() == null) {
            return whole(file + ": not a reach map of this version (format " + map.format() + ", not " + FORMAT + ")");
        }
        if (!map.surroundings().equals(surroundings(classes, generation))) {
            return whole("the reach map was made with another build of the tool, Java, classpath, test settings or operators");
        }
        ClassGraph main = classes.main();
        Map<String, String> schemaPaths = schemaPathsBySource(main, schema);
        Set<String> sources = new TreeSet<>(main.sources());
        sources.addAll(map.files().keySet());
        Set<Integer> changedPoints = new HashSet<>();
        Set<String> changedMethods = new HashSet<>();
        Set<String> changedFiles = new TreeSet<>();
        Set<String> changedBodiesOnly = new TreeSet<>();
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
                String path = schemaPaths.get(source);
                if (path != null && mapped.skeleton() != null && mapped.skeleton().equals(schema.skeleton(path))) {
                    changedBodiesOnly.add(path);
                    Map<String, String> now = schema.bodiesIn(path);
                    Set<String> names = new TreeSet<>(now.keySet());
                    names.addAll(mapped.bodies().keySet());
                    names.stream().filter(name -> !Objects.equals(now.get(name), mapped.bodies().get(name))).forEach(changedMethods::add);
                } else {
                    IntStream.of(mapped.points()).forEach(changedPoints::add);
                }
            }
        }
        for (int number : map.initialising()) {
            if (changedMethods.contains(map.methods().get(number))) {
                return whole(map.methods().get(number) + " changed, and it runs while the classes are initialised, before any test");
            }
        }
        Set<String> mapPoints = new HashSet<>(map.points());
        for (Point point : points) {
            String source = main.sourceOf(point.file());
            boolean rerunWhereItIs = source != null && changedFiles.contains(source) && (!changedBodiesOnly.contains(point.file())
                    || isOneOf(schema.methodAt(point.file(), point.host().begin()), changedMethods));
            if (source != null && !rerunWhereItIs && !mapPoints.contains(point.fingerprint())) {
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
            boolean touched = tests.stream().anyMatch(test -> IntStream.of(test.reached()).anyMatch(changedPoints::contains)
                    || IntStream.of(test.entered()).anyMatch(number -> changedMethods.contains(map.methods().get(number))));
            if (!same || touched || tests.isEmpty()) {
                runs.add(testClass);
            } else {
                reused.addAll(tests);
            }
        }
        int[] ids = idsOf(map.points(), points.stream().map(Point::fingerprint).toList());
        int[] methodIds = idsOf(map.methods(), schema.methods().stream().map(EntryMethod::name).toList());
        List<RecordedTest> mapped = reused.stream().map(test -> recorded(test, ids, methodIds, points.size())).toList();
        return new Choice(runs, mapped, "reach map: " + runs.size() + " of " + suiteClasses.size() + " test classes run (new, changed,"
                + " or reaching " + changedFiles.size() + (changedFiles.size() == 1 ? " changed file" : " changed files") + "); the reach of "
                + mapped.size() + " tests comes from the map");
    }

    /** The project-relative path of each schema file, by its main source's package path (where the classes know it). */
    private static Map<String, String> schemaPathsBySource(ClassGraph main, SchemaCode schema) {
        Map<String, String> paths = new HashMap<>();
        for (String path : schema.paths()) {
            String source = main.sourceOf(path);
            if (source != null) {
                paths.put(source, path);
            }
        }
        return paths;
    }

    /** Whether the method (null: none) is among the named ones. */
    private static boolean isOneOf(EntryMethod method, Set<String> names) {
        return method != null && names.contains(method.name());
    }

    private static Choice whole(String why) {
        return new Choice(null, List.of(), why + ": the whole suite runs");
    }

    /** For each map number, the point's or the method's id in this run's schema, or -1 where the schema does not have it. */
    private static int[] idsOf(List<String> mapped, List<String> now) {
        Map<String, Integer> ids = new HashMap<>();
        for (int id = 0; id < now.size(); id++) {
            ids.put(now.get(id), id);
        }
        return mapped.stream().mapToInt(name -> ids.getOrDefault(name, -1)).toArray();
    }

    /** A mapped test in this run's ids: points, then infections from {@code pointCount}, entries from twice that. */
    private static RecordedTest recorded(MappedTest test, int[] ids, int[] methodIds, int pointCount) {
        IntStream reached = IntStream.of(test.reached()).map(number -> ids[number]).filter(id -> id >= 0);
        IntStream infected = IntStream.of(test.infected()).map(number -> ids[number]).filter(id -> id >= 0).map(id -> id + pointCount);
        IntStream entered = IntStream.of(test.entered()).map(number -> methodIds[number]).filter(id -> id >= 0)
                .map(id -> id + 2 * pointCount);
        return new RecordedTest(test.id(), test.name(), test.className(), test.status(), test.message(), test.nanos(),
                test.aloneNanos(), IntStream.concat(IntStream.concat(reached, infected), entered).toArray());
    }

    /**
     * Writes the map of a baseline that ran with every point of the project in its schema.
     *
     * @throws IOException when the file cannot be written
     */
    public static void write(Path file, ProjectClasses classes, String generation, SchemaCode schema, Baseline baseline)
            throws IOException {
        List<Point> points = schema.points();
        int pointCount = points.size();
        ClassGraph main = classes.main();
        Map<String, List<Integer>> pointsBySource = new TreeMap<>();
        main.sources().forEach(source -> pointsBySource.put(source, new ArrayList<>()));
        for (int id = 0; id < pointCount; id++) {
            String source = main.sourceOf(points.get(id).file());
            if (source != null) {
                pointsBySource.get(source).add(id);
            }
        }
        Map<String, String> schemaPaths = schemaPathsBySource(main, schema);
        Map<String, MappedFile> files = new TreeMap<>();
        pointsBySource.forEach((source, ids) -> {
            String path = schemaPaths.get(source);
            files.put(source, new MappedFile(main.digestOf(main.classesOfSource(source)), ids.stream().mapToInt(Integer::intValue).toArray(),
                    path == null ? null : schema.skeleton(path), path == null ? null : schema.bodiesIn(path)));
        });
        Map<String, String> testClasses = new TreeMap<>();
        List<MappedTest> tests = new ArrayList<>();
        for (RecordedTest test : baseline.tests()) {
            if (test.className() != null) {
                String owner = ProjectClasses.topLevel(test.className());
                testClasses.computeIfAbsent(owner, name -> classes.testClassDigest(name.replace('/', '.')));
            }
            int[] reached = test.reached();
            tests.add(new MappedTest(test.id(), test.name(), test.className(), test.status(), test.message(), test.nanos(),
                    test.aloneNanos(), IntStream.of(reached).filter(id -> id < pointCount).toArray(),
                    IntStream.of(reached).filter(id -> id >= pointCount && id < 2 * pointCount).map(id -> id - pointCount).toArray(),
                    entered(reached, pointCount)));
        }
        Contents contents = new Contents(FORMAT, surroundings(classes, generation), points.stream().map(Point::fingerprint).toList(),
                schema.methods().stream().map(EntryMethod::name).toList(), entered(baseline.reachedWhileInitialising(), pointCount),
                files, testClasses, tests);
        Files.createDirectories(file.getParent());
        AtomicFiles.write(file, out -> JSON.writeValue(out, contents));
    }

    /** The methods among reach ids, by number: entries are recorded from twice the point count on. */
    private static int[] entered(int[] reached, int pointCount) {
        return IntStream.of(reached).filter(id -> id >= 2 * pointCount).map(id -> id - 2 * pointCount).toArray();
    }

    private static String surroundings(ProjectClasses classes, String generation) {
        return SourceHash.sha256(classes.surroundings() + "\npoints made by " + generation + "\n");
    }

    /** A notice for a map that could not be written; the run does not depend on it. */
    public static String unwritten(Path file, Exception e) {
        return file + ": could not write the reach map (" + Text.firstLine(String.valueOf(e.getMessage())) + ")";
    }
}
