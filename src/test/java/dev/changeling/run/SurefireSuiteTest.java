package dev.changeling.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.ExitCode;
import dev.changeling.results.TestRecord;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.TimeUnit;
import java.util.function.Function;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import javax.xml.XMLConstants;
import javax.xml.parsers.DocumentBuilder;
import javax.xml.parsers.DocumentBuilderFactory;
import javax.xml.parsers.ParserConfigurationException;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;
import org.xml.sax.SAXException;

/**
 * The surefire-setup sample, whose tests pass only with its pom's Surefire configuration (includes, excludes,
 * excluded tags, system properties, environment, argLine, working directory): {@code changeling run} must start
 * from a green baseline and run exactly the tests that {@code mvn test} runs there. The reference is Maven
 * Surefire's own XML reports ({@code target/surefire-reports/TEST-*.xml}) of the same sample.
 */
@Tag("e2e")
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class SurefireSuiteTest {

    static final String SAMPLE = "surefire-setup";
    static final long MAVEN_LIMIT_SECONDS = 600;

    /**
     * What Surefire 3.5.4 runs in the sample, by report class name: worked out from the sample's pom and read off
     * Surefire's own XML reports of it. Nested classes are reported as {@code Outer$Inner}.
     */
    static final Map<String, Integer> SUREFIRE_CLASSES = new TreeMap<>(Map.of(
            "dev.changeling.samples.apiary.HarvestTestCases$Boxes", 2,
            "dev.changeling.samples.apiary.HarvestTestCases$Surplus", 3,
            "dev.changeling.samples.apiary.HiveRosterTest", 2,
            "dev.changeling.samples.apiary.NectarFlowTest", 4,
            "dev.changeling.samples.apiary.ScaleCalibrationTest", 4,
            "dev.changeling.samples.apiary.SwarmAlarmCheck", 3,
            "dev.changeling.samples.apiary.WeighingArchiveTest", 3,
            "dev.changeling.samples.apiary.YardReportTest", 5));

    /** "judgesTheDailyGain(int, NectarFlow)[2]": the method, its parameter list, and the invocation's number. */
    private static final Pattern SUREFIRE_NAME = Pattern.compile("([^(\\[]+)(?:\\([^)]*\\))?(?:\\[(\\d+)])?");

    /** The unique id's segment types that name a test method, a template or a factory. */
    private static final List<String> METHOD_SEGMENTS = List.of("method", "test-template", "test-factory");

    /** The unique id's segment types that number one invocation of a template or one dynamic test. */
    private static final List<String> INVOCATION_SEGMENTS = List.of("test-template-invocation", "dynamic-test");

    List<String> surefireTests;
    String mavenOutput;
    ToolRun run;

    /** Maven first, then the tool, each on its own fresh copy. The limit only keeps a hang from blocking the build. */
    @BeforeAll
    @Timeout(value = 10, unit = TimeUnit.MINUTES)
    void runMavenAndTheTool(@TempDir Path temporary) {
        Path maven = SampleProjects.copy(SAMPLE, temporary.resolve("maven"));
        ExternalCommand.Ended built = mavenTest(maven, true);
        if (!succeeded(built) && built.output().contains("offline")) {
            built = mavenTest(maven, false);
        }
        mavenOutput = built.output();
        assertTrue(succeeded(built), () -> "mvn test failed on the sample itself:\n" + mavenOutput);
        surefireTests = fromSurefireReports(maven.resolve("target").resolve("surefire-reports"));

        run = ToolRun.onCopyOf(SAMPLE, temporary.resolve("tool"), "--operators", "relational-subset");
    }

    private static ExternalCommand.Ended mavenTest(Path project, boolean offline) {
        List<String> command = new ArrayList<>(List.of("mvn", "-B", "-q", "-Dstyle.color=never"));
        if (offline) {
            command.add("-o");
        }
        command.add("test");
        return ExternalCommand.run(project, Map.of(), MAVEN_LIMIT_SECONDS, command);
    }

    private static boolean succeeded(ExternalCommand.Ended built) {
        return built.finished() && built.exitCode() == 0;
    }

    /** Every {@code <testcase>} of every {@code TEST-*.xml}, as "class#method", sorted. */
    static List<String> fromSurefireReports(Path reports) {
        List<String> tests = new ArrayList<>();
        try (Stream<Path> files = Files.list(reports)) {
            List<Path> xml = files.filter(file -> file.getFileName().toString().matches("TEST-.*\\.xml")).sorted().toList();
            assertFalse(xml.isEmpty(), () -> "no TEST-*.xml in " + reports);
            DocumentBuilder parser = parser();
            for (Path file : xml) {
                NodeList cases = parser.parse(file.toFile()).getElementsByTagName("testcase");
                for (int index = 0; index < cases.getLength(); index++) {
                    Element testCase = (Element) cases.item(index);
                    tests.add(fromSurefire(testCase.getAttribute("classname"), testCase.getAttribute("name")));
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (SAXException e) {
            throw new IllegalStateException("Surefire wrote a report the JDK's parser cannot read", e);
        }
        return tests.stream().sorted().toList();
    }

    private static DocumentBuilder parser() {
        try {
            DocumentBuilderFactory factory = DocumentBuilderFactory.newInstance();
            factory.setFeature(XMLConstants.FEATURE_SECURE_PROCESSING, true);
            factory.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
            return factory.newDocumentBuilder();
        } catch (ParserConfigurationException e) {
            throw new IllegalStateException(e);
        }
    }

    /** "a.b.FooTest", "bar(int, String)[2]" → "a.b.FooTest#bar[2]"; a plain "bar" stays "bar". */
    static String fromSurefire(String className, String name) {
        Matcher matcher = SUREFIRE_NAME.matcher(name);
        if (!matcher.matches()) {
            return className + "#" + name;
        }
        String invocation = matcher.group(2) == null ? "" : "[" + matcher.group(2) + "]";
        return className + "#" + matcher.group(1) + invocation;
    }

    /**
     * A JUnit Platform unique id as "class#method" in Surefire's spelling: nested classes joined with {@code $},
     * the parameter list dropped, an invocation's number kept as {@code [n]}.
     * {@code [engine:junit-jupiter]/[class:a.Foo]/[nested-class:Bar]/[test-template:baz(int)]/[test-template-invocation:#2]}
     * → {@code a.Foo$Bar#baz[2]}.
     */
    static String fromUniqueId(String id) {
        StringBuilder className = new StringBuilder();
        StringBuilder method = new StringBuilder();
        for (String segment : segments(id)) {
            int colon = segment.indexOf(':');
            String type = segment.substring(0, colon);
            String value = segment.substring(colon + 1);
            if (type.equals("class")) {
                className.setLength(0);
                className.append(value);
            } else if (type.equals("nested-class")) {
                className.append('$').append(value);
            } else if (METHOD_SEGMENTS.contains(type)) {
                int parameters = value.indexOf('(');
                method.append(parameters < 0 ? value : value.substring(0, parameters));
            } else if (INVOCATION_SEGMENTS.contains(type)) {
                method.append('[').append(value.startsWith("#") ? value.substring(1) : value).append(']');
            }
        }
        return className + "#" + method;
    }

    /** "[a:b]/[c:d(int[])]" → "a:b", "c:d(int[])"; a value may hold brackets, so segments split on "]/[" only. */
    private static List<String> segments(String id) {
        String inner = id.startsWith("[") && id.endsWith("]") ? id.substring(1, id.length() - 1) : id;
        return List.of(inner.split("]/\\["));
    }

    List<String> toolTests() {
        assertNotNull(run.results(), () -> "the run wrote no results file\n" + run.transcript());
        return run.results().tests().stream().map(TestRecord::id).map(SurefireSuiteTest::fromUniqueId).sorted().toList();
    }

    static Map<String, Integer> perClass(List<String> tests) {
        return tests.stream().collect(Collectors.groupingBy(test -> test.substring(0, test.indexOf('#')), TreeMap::new,
                Collectors.summingInt(test -> 1)));
    }

    String bothLists(List<String> tool) {
        Function<List<String>, String> lines = tests -> tests.stream().map(test -> "  " + test).collect(Collectors.joining("\n"));
        return "Surefire ran " + surefireTests.size() + ":\n" + lines.apply(surefireTests)
                + "\nthe tool ran " + tool.size() + ":\n" + lines.apply(tool);
    }

    @Nested
    class TheSampleUnderMaven {

        @Test
        void runsTheClassesItsPomAsksFor_andLeavesOutTheExcludedOnes() {
            assertEquals(SUREFIRE_CLASSES, perClass(surefireTests), () -> String.join("\n", surefireTests));
        }
    }

    @Nested
    class TheToolOnTheSample {

        @Test
        void startsFromAGreenBaseline() {
            assertEquals(ExitCode.OK, run.exitCode(), run::transcript);
        }

        @Test
        void runsAsManyTestsOfEachClassAsSurefire() {
            List<String> tool = toolTests();
            assertEquals(perClass(surefireTests), perClass(tool), () -> bothLists(tool));
        }

        @Test
        void runsExactlyTheTestsSurefireRuns() {
            List<String> tool = toolTests();
            assertEquals(surefireTests, tool, () -> bothLists(tool));
        }
    }

    @Nested
    class Names {

        @Test
        void surefiresNames_dropTheParameterList_andKeepTheInvocation() {
            assertEquals("a.b.FooTest#bar[2]", fromSurefire("a.b.FooTest", "bar(int, String)[2]"));
            assertEquals("a.b.FooTest$Inner#bar", fromSurefire("a.b.FooTest$Inner", "bar"));
        }

        @Test
        void uniqueIds_joinNestedClasses_andKeepTheInvocation() {
            assertEquals("a.b.FooTest#bar", fromUniqueId("[engine:junit-jupiter]/[class:a.b.FooTest]/[method:bar()]"));
            assertEquals("a.b.FooTest$Inner#bar[2]", fromUniqueId("[engine:junit-jupiter]/[class:a.b.FooTest]/[nested-class:Inner]"
                    + "/[test-template:bar(int, java.lang.String)]/[test-template-invocation:#2]"));
            assertEquals("a.b.FooTest#bar", fromUniqueId("[engine:junit-jupiter]/[class:a.b.FooTest]/[method:bar(int[])]"));
        }
    }
}
