package dev.changeling.recall;

import dev.changeling.execution.Baseline;
import dev.changeling.execution.RecordedTest;
import dev.changeling.mutant.Mutant;
import dev.changeling.mutant.Point;
import dev.changeling.source.SourceHash;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Stream;

/**
 * The content a mutant's verdict depends on, as one digest: the mutant (its fingerprint and its file's text), the
 * original classes of its file, every test that decided it with what that test ran, and the surroundings. What a test
 * ran: its class with every test class it names (through their constant pools), and the classes of each main file
 * whose mutation points it reached in the baseline. The surroundings: the run's settings, this tool's build, the Java
 * runtime, every jar and folder of the test classpath, the resources of the output folders, and the classes of every
 * main file that has no point in the schema (no reach is known there, so any test may run them). Equal digests mean
 * equal inputs; nothing is keyed by time.
 *
 * <p>What this cannot see, because reach is known only where there are points: a change confined to code without
 * points (a field's initial value, a constructor that only assigns fields) in a file a test reaches no point of, and
 * code that only the mutant's own run enters (a branch the unmutated test never takes). Verdicts resting on such code
 * are given again; {@code run --run-all} runs every mutant.
 */
public final class VerdictKeys {

    private final ClassGraph main;
    private final ClassGraph tests;
    private final String surroundings;
    private final Baseline baseline;
    private final List<Point> points;
    private final Map<String, String> fileDigests = new HashMap<>();
    private final Map<String, String> testDigests = new HashMap<>();

    private VerdictKeys(ClassGraph main, ClassGraph tests, String surroundings, Baseline baseline, List<Point> points) {
        this.main = main;
        this.tests = tests;
        this.surroundings = surroundings;
        this.baseline = baseline;
        this.points = points;
    }

    /**
     * @param classes   the compiled main classes
     * @param testRoots the folders of compiled test classes
     * @param classpath the tests' whole classpath; entries other than the folders above count by their content
     * @param settings  every run setting that can change a verdict, in words
     * @param points    the schema's points, by id: what the baseline's reach is in
     */
    public static VerdictKeys of(Path classes, List<Path> testRoots, List<Path> classpath, String settings, Baseline baseline,
                                 List<Point> points) {
        List<Path> outputs = new ArrayList<>();
        outputs.add(classes);
        outputs.addAll(testRoots);
        StringBuilder text = new StringBuilder("settings ").append(settings).append('\n')
                .append("tool ").append(ToolBuild.identity()).append('\n')
                .append("java ").append(System.getProperty("java.vendor")).append(' ').append(System.getProperty("java.version")).append('\n');
        for (Path entry : classpath) {
            if (!outputs.contains(entry)) {
                text.append("classpath ").append(entry).append('\n');
                contents(entry, false, text);
            }
        }
        outputs.forEach(folder -> contents(folder, true, text));
        ClassGraph main = ClassGraph.read(List.of(classes));
        Set<String> unreachable = new TreeSet<>(main.names());
        points.stream().map(Point::file).distinct().forEach(file -> main.classesOf(file).forEach(unreachable::remove));
        text.append("without points ").append(main.digestOf(unreachable)).append('\n');
        return new VerdictKeys(main, ClassGraph.read(testRoots), SourceHash.sha256(text.toString()), baseline, points);
    }

    /** The key of a verdict the tests gave: equal keys, equal verdict. */
    public synchronized String forVerdict(Mutant mutant, String fileText, Collection<String> tests) {
        StringBuilder text = new StringBuilder(ofMutant(mutant, fileText));
        mutant.points().stream().map(Point::file).distinct().sorted()
                .forEach(file -> text.append("classes ").append(fileDigest(file)).append('\n'));
        new TreeSet<>(tests).forEach(test -> text.append("test ").append(test).append(' ').append(testDigest(test)).append('\n'));
        return SourceHash.sha256(text.toString());
    }

    /**
     * The key of what compiling the mutant's file on its own and comparing it with the original's found: the file's
     * classes and every main class they name, directly or not, for those are what javac read.
     */
    public synchronized String forComparison(Mutant mutant, String fileText) {
        Set<String> named = new TreeSet<>();
        main.classesOf(mutant.file()).forEach(name -> named.addAll(main.closure(name)));
        return SourceHash.sha256("compared\n" + ofMutant(mutant, fileText) + "named " + main.digestOf(named) + "\n");
    }

    private String ofMutant(Mutant mutant, String fileText) {
        return surroundings + "\nmutant " + mutant.fingerprint() + " " + mutant.file() + " " + SourceHash.sha256(fileText) + "\n";
    }

    /** The classes compiled from one main file. */
    private String fileDigest(String file) {
        return fileDigests.computeIfAbsent(file, path -> main.digestOf(main.classesOf(path)));
    }

    /**
     * What one test ran: its class and the test classes it names, and the main files whose points it reached; a test
     * the baseline does not know, or of unknown class, counts as naming every test class.
     */
    private String testDigest(String id) {
        return testDigests.computeIfAbsent(id, key -> {
            RecordedTest test = baseline.test(key);
            StringBuilder text = new StringBuilder();
            String owner = test == null || test.className() == null ? null : topLevel(test.className());
            text.append("test classes ").append(tests.digestOf(owner == null || !tests.holds(owner) ? tests.names() : tests.closure(owner)))
                    .append('\n');
            if (test != null) {
                Set<String> files = new TreeSet<>();
                for (int point : test.reached()) {
                    if (point < points.size()) {
                        files.add(points.get(point).file());
                    }
                }
                files.forEach(file -> text.append(file).append(' ').append(fileDigest(file)).append('\n'));
            }
            return SourceHash.sha256(text.toString());
        });
    }

    private static String topLevel(String binaryName) {
        String name = binaryName.replace('.', '/');
        int nested = name.indexOf('$', name.lastIndexOf('/') + 1);
        return nested < 0 ? name : name.substring(0, nested);
    }

    /**
     * Appends every file of a classpath entry by its digest (a jar: the jar's): of an output folder only the files that
     * are not classes, since the classes count through the graph.
     */
    private static void contents(Path entry, boolean resourcesOnly, StringBuilder text) {
        try {
            if (Files.isRegularFile(entry)) {
                text.append(ClassGraph.digest(Files.readAllBytes(entry))).append('\n');
            } else if (Files.isDirectory(entry)) {
                try (Stream<Path> files = Files.walk(entry)) {
                    for (Path file : files.filter(Files::isRegularFile).sorted().toList()) {
                        String name = entry.relativize(file).toString().replace('\\', '/');
                        if (!resourcesOnly || !name.endsWith(".class")) {
                            text.append(name).append(' ').append(ClassGraph.digest(Files.readAllBytes(file))).append('\n');
                        }
                    }
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
