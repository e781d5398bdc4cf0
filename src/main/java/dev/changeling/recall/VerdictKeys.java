package dev.changeling.recall;

import dev.changeling.execution.Baseline;
import dev.changeling.execution.RecordedTest;
import dev.changeling.mutant.Mutant;
import dev.changeling.mutant.Point;
import dev.changeling.source.SourceHash;
import java.util.Collection;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The content a mutant's verdict depends on, as one digest: the mutant (its fingerprint and its file's text), the
 * original classes of its file, every test that decided it with what that test ran, and the surroundings. What a test
 * ran: its class with every test class it names (through their constant pools), and the classes of each main file
 * whose mutation points it reached in the baseline. The surroundings: those of {@link ProjectClasses}, the run's
 * settings, and the classes of every main file that has no point in the schema (no reach is known there, so any test
 * may run them). Equal digests mean equal inputs; nothing is keyed by time.
 *
 * <p>What this cannot see, because reach is known only where there are points: a change confined to code without
 * points (a field's initial value, a constructor that only assigns fields) in a file a test reaches no point of, and
 * code that only the mutant's own run enters (a branch the unmutated test never takes). Verdicts resting on such code
 * are given again; {@code run --run-all} runs every mutant.
 */
public final class VerdictKeys {

    private static final Pattern TEST_METHOD = Pattern.compile("\\[(?:method|test-template|test-factory|test):([^(\\]]+)\\(");

    private final ProjectClasses classes;
    private final String surroundings;
    private final Baseline baseline;
    private final List<Point> points;
    private final Map<String, String> testDigests = new HashMap<>();

    private VerdictKeys(ProjectClasses classes, String surroundings, Baseline baseline, List<Point> points) {
        this.classes = classes;
        this.surroundings = surroundings;
        this.baseline = baseline;
        this.points = points;
    }

    /**
     * @param settings every run setting beyond the tests' JVM that can change a verdict (deadlines, say), in words
     * @param points   the schema's points, by id: what the baseline's reach is in
     */
    public static VerdictKeys of(ProjectClasses classes, String settings, Baseline baseline, List<Point> points) {
        ClassGraph main = classes.main();
        Set<String> unreachable = new TreeSet<>(main.names());
        points.stream().map(Point::file).distinct().forEach(file -> main.classesOf(file).forEach(unreachable::remove));
        String surroundings = SourceHash.sha256(classes.surroundings() + "\nsettings " + settings + "\nwithout points "
                + main.digestOf(unreachable) + "\n");
        return new VerdictKeys(classes, surroundings, baseline, points);
    }

    /** The key of a verdict the tests gave: equal keys, equal verdict. */
    public synchronized String forVerdict(Mutant mutant, String fileText, Collection<String> tests) {
        StringBuilder text = new StringBuilder(ofMutant(mutant, fileText));
        mutant.points().stream().map(Point::file).distinct().sorted()
                .forEach(file -> text.append("classes ").append(classes.fileDigest(file)).append('\n'));
        new TreeSet<>(tests).forEach(test -> text.append("test ").append(test).append(' ').append(testDigest(test)).append('\n'));
        return SourceHash.sha256(text.toString());
    }

    /**
     * The key of what compiling the mutant's file on its own and comparing it with the original's found: the file's
     * classes, and what javac reads of every main class they name, directly or not (not the code of their methods).
     */
    public synchronized String forComparison(Mutant mutant, String fileText) {
        ClassGraph main = classes.main();
        List<String> own = main.classesOf(mutant.file());
        Set<String> named = new TreeSet<>();
        own.forEach(name -> named.addAll(main.closure(name)));
        named.removeAll(own);
        return SourceHash.sha256("compared\n" + ofMutant(mutant, fileText) + "classes " + main.digestOf(own) + "\nnamed "
                + main.apiDigestOf(named) + "\n");
    }

    private String ofMutant(Mutant mutant, String fileText) {
        return surroundings + "\nmutant " + mutant.fingerprint() + " " + mutant.file() + " " + SourceHash.sha256(fileText) + "\n";
    }

    /**
     * The name of a test's method in its JUnit unique id ({@code [method:name(…)]}, a template's or a factory's, or a
     * JUnit 4 runner's {@code [test:name(…)]}), or null.
     */
    static String methodOf(String id) {
        Matcher matcher = TEST_METHOD.matcher(id);
        String name = null;
        while (matcher.find()) {
            name = matcher.group(1);
        }
        return name;
    }

    /**
     * What one test ran: its class and the test classes it names, and the main files whose points it reached; a test
     * the baseline does not know, or of unknown class, counts as naming every test class.
     */
    private String testDigest(String id) {
        return testDigests.computeIfAbsent(id, key -> {
            RecordedTest test = baseline.test(key);
            StringBuilder text = new StringBuilder("test classes ")
                    .append(test == null ? classes.testClassDigest(null) : classes.testDigest(test.className(), methodOf(test.id())))
                    .append('\n');
            if (test != null) {
                Set<String> files = new TreeSet<>();
                for (int point : test.reached()) {
                    if (point < points.size()) {
                        files.add(points.get(point).file());
                    }
                }
                files.forEach(file -> text.append(file).append(' ').append(classes.fileDigest(file)).append('\n'));
            }
            return SourceHash.sha256(text.toString());
        });
    }
}
