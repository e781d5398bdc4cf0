package dev.changeling.execution;

import dev.changeling.probe.Probe;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import javax.tools.JavaCompiler;
import javax.tools.ToolProvider;

/**
 * A small project written and compiled for the tests: production classes that call {@code Probe.on(n)}
 * the way schema-rewritten code does, and JUnit Jupiter tests for them, some of them hostile.
 *
 * <p>Points: 0 {@code add} subtracts; 1 {@code times} adds; 2 {@code countUpTo} never ends; 3
 * {@code checkout} calls System.exit(7); 4 {@code hog} fills the heap; 5 the value a class setup
 * reads turns bad; 6 reached by no test; 7 in a static initialiser; 8 {@code depth} recurses without
 * end; 9 {@code spawn} starts a child process and then waits forever; 10 {@code leak} starts a thread
 * that never ends; 11 {@code write} writes one mark too many on a sheet that a test class shares between its tests;
 * 12 {@code retry} never ends and swallows every error thrown in it, a stop included.
 *
 * <p>{@code TillTest}, the first time it runs where the system property {@code shop.tillMarker} names a file that
 * is not there yet, makes that file, connects to the port {@code shop.till} names, sends its JVM's pid and waits
 * for an answer that never comes, so a test can kill its JVM from outside while it runs; then it checks {@code add}.
 *
 * <p>{@code ScratchTest} makes the folder that the system property {@code shop.scratch} names and marks it
 * {@code deleteOnExit}, as tests that tidy up after themselves do: only a JVM that exits normally deletes it.
 *
 * <p>A launcher started in a JVM with {@code -Dshop.slowStart=<ms>} takes that long to start, once per JVM, as
 * loading a large suite's engines and classes can: {@code shop.SlowStart}, a registered test execution listener,
 * sleeps in its static initialiser.
 */
final class TinyProject {

    static final int POINTS = 13;

    static final String PRICES = """
            package shop;

            import dev.changeling.probe.Probe;
            import java.nio.file.Files;
            import java.nio.file.Path;
            import java.util.ArrayList;
            import java.util.List;

            public final class Prices {
                public static int add(int a, int b) { return Probe.on(0) ? a - b : a + b; }
                public static int times(int a, int b) { return Probe.on(1) ? a + b : a * b; }
                public static int countUpTo(int n) {
                    int count = 0;
                    for (int i = 0; Probe.on(2) || i < n; i++) { count++; }
                    return count;
                }
                public static void checkout() { if (Probe.on(3)) { System.exit(7); } }
                public static long hog() {
                    if (Probe.on(4)) {
                        List<long[]> hoard = new ArrayList<>();
                        while (true) {
                            hoard.add(new long[1 << 20]);
                            long until = System.nanoTime() + 20_000_000L;
                            while (System.nanoTime() < until) { }
                        }
                    }
                    return 0;
                }
                public static int setupValue() { return Probe.on(5) ? -1 : 1; }
                public static int unreached() { return Probe.on(6) ? 0 : 1; }
                public static int depth(int n) { return Probe.on(8) ? depth(n + 1) + 1 : n; }
                public static void spawn() throws Exception {
                    if (Probe.on(9)) {
                        Process child = new ProcessBuilder("sleep", "600").start();
                        Files.createDirectories(Path.of("target"));
                        Files.writeString(Path.of("target", "child.pid"), Long.toString(child.pid()));
                        while (true) { Thread.sleep(50); }
                    }
                }
                public static int retry(int n) {
                    int tries = 0;
                    while (true) {
                        try {
                            tries++;
                            if (!Probe.on(12) && tries >= n) { return tries; }
                        } catch (Throwable swallowed) {
                            // a retry loop that trusts nothing
                        }
                    }
                }
                public static void write(StringBuilder sheet) {
                    sheet.append('x');
                    if (Probe.on(11)) { sheet.append('x'); }
                }
                public static void leak() {
                    if (Probe.on(10)) {
                        new Thread(() -> { while (true) { try { Thread.sleep(50); } catch (InterruptedException e) { } } }).start();
                    }
                }
            }
            """;

    static final String RATES = """
            package shop;

            import dev.changeling.probe.Probe;

            public final class Rates {
                private static final int BASE;
                static { BASE = Probe.on(7) ? 0 : 100; }
                public static int base() { return BASE; }
            }
            """;

    static final Map<String, String> TESTS = Map.ofEntries(
            Map.entry("shop/PricesTest.java", """
                    package shop;

                    import static org.junit.jupiter.api.Assertions.assertEquals;
                    import static org.junit.jupiter.api.Assumptions.assumeTrue;

                    import org.junit.jupiter.api.Disabled;
                    import org.junit.jupiter.api.Nested;
                    import org.junit.jupiter.api.Test;
                    import org.junit.jupiter.params.ParameterizedTest;
                    import org.junit.jupiter.params.provider.ValueSource;

                    class PricesTest {
                        @Test void addsTwoNumbers() { assertEquals(5, Prices.add(2, 3)); }
                        @Test void addsZero() { assertEquals(2, Prices.add(2, 0)); }
                        @Test void multiplies() { assertEquals(6, Prices.times(2, 3)); }
                        @Test void multipliesTwos() { assertEquals(4, Prices.times(2, 2)); }
                        @Test void multipliesByOne() { assertEquals(3, Prices.times(3, 1)); }
                        @Test void assumesSomething() { assumeTrue(false, "not here"); }
                        @Disabled("kept for later") @Test void disabled() { }
                        @ParameterizedTest @ValueSource(ints = {0, 4}) void doubles(int x) { assertEquals(2 * x, Prices.add(x, x)); }
                        @Nested class WhenEmpty {
                            @Test void addsNothing() { assertEquals(0, Prices.add(0, 0)); }
                        }
                    }
                    """),
            Map.entry("shop/SetupTest.java", """
                    package shop;

                    import static org.junit.jupiter.api.Assertions.assertEquals;

                    import org.junit.jupiter.api.BeforeAll;
                    import org.junit.jupiter.api.Test;

                    class SetupTest {
                        static int value;
                        @BeforeAll static void setUp() {
                            value = Prices.setupValue();
                            if (value < 0) { throw new IllegalStateException("bad setup"); }
                        }
                        @Test void first() { assertEquals(1, value); }
                        @Test void second() { assertEquals(1, value); }
                    }
                    """),
            Map.entry("shop/HostileTest.java", """
                    package shop;

                    import static org.junit.jupiter.api.Assertions.assertEquals;

                    import org.junit.jupiter.api.Test;

                    class HostileTest {
                        @Test void countsToThree() { assertEquals(3, Prices.countUpTo(3)); }
                        @Test void checksOut() { Prices.checkout(); }
                        @Test void hogs() { assertEquals(0, Prices.hog()); }
                        @Test void measuresDepth() { assertEquals(5, Prices.depth(5)); }
                        @Test void spawns() throws Exception { Prices.spawn(); }
                        @Test void leaks() { Prices.leak(); }
                        @Test void retries() { assertEquals(2, Prices.retry(2)); }
                    }
                    """),
            Map.entry("shop/SharedSheetTest.java", """
                    package shop;

                    import static org.junit.jupiter.api.Assertions.assertEquals;

                    import org.junit.jupiter.api.Test;

                    class SharedSheetTest {
                        static final StringBuilder SHEET = new StringBuilder();
                        @Test void writesOneMark() { Prices.write(SHEET); assertEquals("x", SHEET.toString()); SHEET.setLength(0); }
                        @Test void findsTheSheetClean() { assertEquals("", SHEET.toString()); }
                    }
                    """),
            Map.entry("shop/NotepadTest.java", """
                    package shop;

                    import static org.junit.jupiter.api.Assertions.assertEquals;

                    import org.junit.jupiter.api.Test;

                    class NotepadTest {
                        static final StringBuilder NOTE = new StringBuilder();
                        @Test void notesThenCounts() { NOTE.append('y'); assertEquals(3, Prices.countUpTo(3)); NOTE.setLength(0); }
                        @Test void findsNoNote() { assertEquals("", NOTE.toString()); }
                    }
                    """),
            Map.entry("shop/TillTest.java", """
                    package shop;

                    import static org.junit.jupiter.api.Assertions.assertEquals;

                    import java.io.File;
                    import java.io.PrintWriter;
                    import java.net.InetAddress;
                    import java.net.Socket;
                    import org.junit.jupiter.api.Test;

                    class TillTest {
                        @Test void addsUpTheTill() throws Exception {
                            String marker = System.getProperty("shop.tillMarker");
                            if (marker != null && new File(marker).createNewFile()) {
                                try (Socket till = new Socket(InetAddress.getLoopbackAddress(), Integer.getInteger("shop.till"))) {
                                    PrintWriter out = new PrintWriter(till.getOutputStream(), true);
                                    out.println(ProcessHandle.current().pid());
                                    till.getInputStream().read();
                                }
                            }
                            assertEquals(5, Prices.add(2, 3));
                        }
                    }
                    """),
            Map.entry("shop/ScratchTest.java", """
                    package shop;

                    import java.io.File;
                    import org.junit.jupiter.api.Test;

                    class ScratchTest {
                        @Test void keepsAScratchFolderWhileTheJvmRuns() {
                            File scratch = new File(System.getProperty("shop.scratch", "target/scratch"));
                            scratch.mkdirs();
                            scratch.deleteOnExit();
                        }
                    }
                    """),
            Map.entry("shop/RatesTest.java", """
                    package shop;

                    import static org.junit.jupiter.api.Assertions.assertEquals;

                    import org.junit.jupiter.api.Test;

                    class RatesTest {
                        @Test void hasABase() { assertEquals(100, Rates.base()); }
                        static class StaticInnerTest {
                            @Test void isLeftOutLikeMavenLeavesItOut() { }
                        }
                    }
                    """),
            Map.entry("shop/TaggedTest.java", """
                    package shop;

                    import static org.junit.jupiter.api.Assertions.assertEquals;

                    import org.junit.jupiter.api.Tag;
                    import org.junit.jupiter.api.Test;

                    @Tag("slow")
                    class TaggedTest {
                        @Test void addsSlowly() { assertEquals(5, Prices.add(2, 3)); }
                    }
                    """),
            Map.entry("shop/SlowStart.java", """
                    package shop;

                    import org.junit.platform.launcher.TestExecutionListener;

                    public final class SlowStart implements TestExecutionListener {
                        static {
                            try {
                                Thread.sleep(Long.getLong("shop.slowStart", 0));
                            } catch (InterruptedException e) {
                                Thread.currentThread().interrupt();
                            }
                        }
                    }
                    """),
            Map.entry("shop/PriceChecks.java", """
                    package shop;

                    import static org.junit.jupiter.api.Assertions.assertEquals;

                    import org.junit.jupiter.api.Test;

                    class PriceChecks {
                        @Test void isNotPickedUpByTheDefaultPatterns() { assertEquals(5, Prices.add(2, 3)); }
                    }
                    """));

    final Path root;
    final Path classes;
    final Path testClasses;

    private TinyProject(Path root) {
        this.root = root;
        this.classes = root.resolve("target/classes");
        this.testClasses = root.resolve("target/test-classes");
    }

    /**
     * The test classes below a folder that Maven Surefire's default patterns select ({@code Test*}, {@code *Test},
     * {@code *Tests}, {@code *TestCase}, no nested classes), sorted.
     */
    static List<String> defaultTestClasses(Path testClasses) throws IOException {
        java.util.function.Predicate<String> named = ClassPatterns.anyOf(List.of("Test*", "*Test", "*Tests", "*TestCase"));
        try (java.util.stream.Stream<Path> files = Files.walk(testClasses)) {
            return files.map(file -> testClasses.relativize(file).toString().replace('/', '.'))
                    .filter(name -> name.endsWith(".class") && !name.contains("$"))
                    .map(name -> name.substring(0, name.length() - ".class".length()))
                    .filter(named)
                    .sorted()
                    .toList();
        }
    }

    /** The test classes of this project that Surefire's default patterns select. */
    List<String> testClassNames() throws IOException {
        return defaultTestClasses(testClasses);
    }

    /** Writes the project below {@code root} and compiles it against the probe and this JVM's JUnit. */
    static TinyProject create(Path root) throws IOException {
        TinyProject project = new TinyProject(root);
        Path sources = root.resolve("src/main/java/shop");
        Files.createDirectories(sources);
        Files.writeString(sources.resolve("Prices.java"), PRICES);
        Files.writeString(sources.resolve("Rates.java"), RATES);
        compile(List.of(sources.resolve("Prices.java"), sources.resolve("Rates.java")), List.of(codeSource(Probe.class)), project.classes);
        List<Path> testSources = new ArrayList<>();
        for (Map.Entry<String, String> test : TESTS.entrySet()) {
            Path file = root.resolve("src/test/java").resolve(test.getKey());
            Files.createDirectories(file.getParent());
            Files.writeString(file, test.getValue());
            testSources.add(file);
        }
        List<Path> testPath = new ArrayList<>(junitJars());
        testPath.add(project.classes);
        compile(testSources, testPath, project.testClasses);
        Path services = project.testClasses.resolve("META-INF/services");
        Files.createDirectories(services);
        Files.writeString(services.resolve("org.junit.platform.launcher.TestExecutionListener"), "shop.SlowStart\n");
        return project;
    }

    /** Compiles one replacement source of {@code Prices} into a folder of its own, as a mutant compiled alone would be. */
    Path compileAlone(String name, String pricesSource) throws IOException {
        Path sources = root.resolve("alone-src/" + name + "/shop");
        Files.createDirectories(sources);
        Path file = sources.resolve("Prices.java");
        Files.writeString(file, pricesSource);
        Path output = root.resolve("target/alone/" + name);
        compile(List.of(file), List.of(codeSource(Probe.class)), output);
        return output;
    }

    /** The test classpath as project discovery would give it: test classes, classes, then the JUnit jars. */
    List<Path> classpath() {
        List<Path> classpath = new ArrayList<>();
        classpath.add(testClasses);
        classpath.add(classes);
        classpath.addAll(junitJars());
        return classpath;
    }

    /** The jars of this JVM's JUnit Platform, Jupiter engine and their dependencies. */
    static List<Path> junitJars() {
        Set<Path> jars = new LinkedHashSet<>();
        for (String type : List.of("org.junit.jupiter.api.Test", "org.junit.jupiter.params.ParameterizedTest",
                "org.junit.jupiter.engine.JupiterTestEngine", "org.junit.platform.engine.TestEngine",
                "org.junit.platform.commons.annotation.Testable", "org.junit.platform.launcher.Launcher",
                "org.opentest4j.AssertionFailedError", "org.apiguardian.api.API")) {
            try {
                jars.add(codeSource(Class.forName(type)));
            } catch (ClassNotFoundException e) {
                throw new IllegalStateException("the test classpath lacks " + type, e);
            }
        }
        return List.copyOf(jars);
    }

    static Path codeSource(Class<?> type) {
        try {
            return Path.of(type.getProtectionDomain().getCodeSource().getLocation().toURI());
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }

    static void compile(List<Path> sources, List<Path> classpath, Path output) throws IOException {
        Files.createDirectories(output);
        JavaCompiler javac = ToolProvider.getSystemJavaCompiler();
        List<String> arguments = new ArrayList<>(List.of("-d", output.toString(), "--release", "17", "-proc:none",
                "-classpath", String.join(java.io.File.pathSeparator, classpath.stream().map(Path::toString).toList())));
        sources.forEach(source -> arguments.add(source.toString()));
        ByteArrayOutputStream messages = new ByteArrayOutputStream();
        int status = javac.run(null, messages, messages, arguments.toArray(String[]::new));
        if (status != 0) {
            throw new IllegalStateException("the fixture does not compile:\n" + messages);
        }
    }
}
