package dev.changeling.recall;

import dev.changeling.execution.Baseline;
import dev.changeling.execution.RecordedTest;
import dev.changeling.mutant.EntryMethods.EntryMethod;
import dev.changeling.mutant.Mutant;
import dev.changeling.mutant.Point;
import dev.changeling.source.SourceHash;
import java.util.BitSet;
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
 * original classes of its file, every test that decided it, the code its run ran, and the surroundings. A test: its
 * class with every test class it names (through their constant pools). The code the run ran: the schema's files less
 * the bodies of the methods whose entry the schema notes ({@link EntryMethods}), and the bodies of those the mutant's
 * run entered (the worker lists them; those entered while the production classes were initialised are among them).
 * The surroundings: those of {@link ProjectClasses}, the run's settings, and the classes of every main file that has
 * no point in the schema (nothing is noted there, so any test may run them). Equal digests mean equal inputs; nothing
 * is keyed by time.
 *
 * <p>So an edit of a method body changes the key of the verdicts whose runs entered that method, and of no other;
 * any other edit of a schema file changes every key. What this cannot see: state that an earlier test left in the
 * worker (a cache filled by a method only that test entered), and code run through reflection on its text.
 */
public final class VerdictKeys {

    private static final Pattern TEST_METHOD = Pattern.compile("\\[(?:method|test-template|test-factory|test):([^(\\]]+)\\(");

    private final ProjectClasses classes;
    private final String surroundings;
    private final Baseline baseline;
    private final SchemaCode schema;
    private final Map<String, String> testDigests = new HashMap<>();
    /** Each file's text with its digest, by path. */
    private final Map<String, Map.Entry<String, String>> fileDigests = new HashMap<>();

    private VerdictKeys(ProjectClasses classes, String surroundings, Baseline baseline, SchemaCode schema) {
        this.classes = classes;
        this.surroundings = surroundings;
        this.baseline = baseline;
        this.schema = schema;
    }

    /** @param settings every run setting beyond the tests' JVM that can change a verdict (deadlines, say), in words */
    public static VerdictKeys of(ProjectClasses classes, String settings, Baseline baseline, SchemaCode schema) {
        ClassGraph main = classes.main();
        Set<String> unreachable = new TreeSet<>(main.names());
        StringBuilder skeletons = new StringBuilder();
        for (String path : schema.paths()) {
            main.classesOf(path).forEach(unreachable::remove);
            skeletons.append(path).append(' ').append(schema.skeleton(path)).append('\n');
        }
        String surroundings = SourceHash.sha256(classes.surroundings() + "\nsettings " + settings + "\nwithout points "
                + main.digestOf(unreachable) + "\nschema files\n" + skeletons);
        return new VerdictKeys(classes, surroundings, baseline, schema);
    }

    /** The names of the schema's methods with these ids, as a verdict's key takes them. */
    public List<String> namesOf(BitSet ids) {
        List<EntryMethod> methods = schema.methods();
        return ids.stream().filter(id -> id < methods.size()).mapToObj(id -> methods.get(id).name()).toList();
    }

    /**
     * The key of a verdict the tests gave: equal keys, equal verdict.
     *
     * @param entered the names of the schema's methods the mutant's run entered ({@link #namesOf})
     */
    public synchronized String forVerdict(Mutant mutant, String fileText, Collection<String> tests, Collection<String> entered) {
        StringBuilder text = new StringBuilder(ofMutant(mutant, fileText));
        mutant.points().stream().map(Point::file).distinct().sorted()
                .forEach(file -> text.append("classes ").append(classes.fileDigest(file)).append('\n'));
        new TreeSet<>(tests).forEach(test -> text.append("test ").append(test).append(' ').append(testDigest(test)).append('\n'));
        new TreeSet<>(entered).forEach(method -> text.append("entered ").append(method).append(' ')
                .append(schema.bodies().getOrDefault(method, "gone")).append('\n'));
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
        return surroundings + "\nmutant " + mutant.fingerprint() + " " + mutant.file() + " " + digestOf(mutant.file(), fileText) + "\n";
    }

    /**
     * The digest of a file's text, computed once per file and run: hashing the whole file again for each of its mutants
     * was a sixth of the tool's own CPU in commons-cli's full run (its files are up to 40 KB, with hundreds of mutants).
     */
    private String digestOf(String path, String text) {
        Map.Entry<String, String> known = fileDigests.get(path);
        if (known == null || !known.getKey().equals(text)) {
            known = Map.entry(text, SourceHash.sha256(text));
            fileDigests.put(path, known);
        }
        return known.getValue();
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

    /** A test: its class and the test classes it names; a test the baseline does not know counts as naming every one. */
    private String testDigest(String id) {
        return testDigests.computeIfAbsent(id, key -> {
            RecordedTest test = baseline.test(key);
            return test == null ? classes.testClassDigest(null) : classes.testDigest(test.className(), methodOf(test.id()));
        });
    }
}
