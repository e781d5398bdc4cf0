package dev.changeling.recall;

import dev.changeling.ToolBuild;
import dev.changeling.source.SourceHash;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

/**
 * A project's compiled classes and what surrounds them, read once per run: what the verdict keys and the reach map
 * compare. The surroundings are one digest of this tool's build, the Java runtime, the tests' JVM settings, every jar
 * and folder of the test classpath by content, and the resources of the output folders.
 */
public final class ProjectClasses {

    private final ClassGraph main;
    private final ClassGraph tests;
    private final String surroundings;
    private final Map<String, String> fileDigests = new HashMap<>();
    private final Map<String, String> testClassDigests = new HashMap<>();
    private final Map<String, String> testMethodDigests = new HashMap<>();

    private ProjectClasses(ClassGraph main, ClassGraph tests, String surroundings) {
        this.main = main;
        this.tests = tests;
        this.surroundings = surroundings;
    }

    /**
     * @param classes   the compiled main classes
     * @param testRoots the folders of compiled test classes
     * @param classpath the tests' whole classpath; entries other than the folders above count by their content
     * @param testJvm   how the tests run (their JVM's options, properties, tags), in words
     */
    public static ProjectClasses read(Path classes, List<Path> testRoots, List<Path> classpath, String testJvm) {
        List<Path> outputs = new ArrayList<>();
        outputs.add(classes);
        outputs.addAll(testRoots);
        StringBuilder text = new StringBuilder("tests run ").append(testJvm).append('\n')
                .append("tool ").append(ToolBuild.identity()).append('\n')
                .append("java ").append(System.getProperty("java.vendor")).append(' ').append(System.getProperty("java.version")).append('\n');
        for (Path entry : classpath) {
            if (!outputs.contains(entry)) {
                text.append("classpath ").append(entry).append(' ').append(SourceHash.ofEntry(entry, file -> true)).append('\n');
            }
        }
        // of the output folders only the resources: their classes count through the graphs
        outputs.forEach(folder -> text.append("resources ").append(folder).append(' ')
                .append(SourceHash.ofEntry(folder, file -> !file.endsWith(".class"))).append('\n'));
        return new ProjectClasses(ClassGraph.read(List.of(classes)), ClassGraph.readTests(testRoots), SourceHash.sha256(text.toString()));
    }

    /** The digest of everything around the classes. */
    String surroundings() {
        return surroundings;
    }

    /** The main classes. */
    ClassGraph main() {
        return main;
    }

    /** The classes compiled from one main file, by its project-relative path. */
    synchronized String fileDigest(String file) {
        return fileDigests.computeIfAbsent(file, path -> main.digestOf(main.classesOf(path)));
    }

    /**
     * A test class (top-level, binary name) with every test class it names, directly or not; for a class unknown here,
     * every test class.
     */
    synchronized String testClassDigest(String testClass) {
        String owner = testClass == null ? "" : topLevel(testClass);
        String start = tests.holds(owner) ? owner : "";
        return testClassDigests.computeIfAbsent(start, name -> tests.digestOf(name.isEmpty() ? tests.names() : tests.closure(name)));
    }

    /**
     * What one test runs of the test classes: those its class names, directly or not, each without its neighbours' test
     * methods ({@link TestMethods}); by its whole class when its method is unknown.
     *
     * @param testClass its class (binary name), or null when unknown: every test class then counts
     * @param method    the name of its test method, or null when unknown
     */
    synchronized String testDigest(String testClass, String method) {
        if (method == null) {
            return testClassDigest(testClass);
        }
        String start = testClass == null ? "" : testClass.replace('.', '/');
        if (!tests.holds(start)) {
            return testClassDigest(testClass);
        }
        return testMethodDigests.computeIfAbsent(start + "#" + method, key -> {
            Set<String> reach = new TreeSet<>(tests.closure(start));
            reach.addAll(tests.closure(topLevel(testClass)));
            return tests.testDigestOf(reach, method);
        });
    }

    /** The top-level class of a binary class name, as an internal name ({@code org/x/FooTest}). */
    static String topLevel(String binaryName) {
        String name = binaryName.replace('.', '/');
        int nested = name.indexOf('$', name.lastIndexOf('/') + 1);
        return nested < 0 ? name : name.substring(0, nested);
    }
}
