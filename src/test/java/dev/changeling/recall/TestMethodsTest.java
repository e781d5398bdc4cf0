package dev.changeling.recall;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import javax.tools.ToolProvider;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Test classes compiled by the JDK's javac against the JUnit on this classpath, split into their test methods and the
 * rest: a new or changed test method leaves its neighbours' digests alone, a changed helper or field does not.
 */
class TestMethodsTest {

    @TempDir
    Path folder;

    static final String TIDE_TEST = """
            package tide;
            import org.junit.jupiter.api.Test;
            import org.junit.jupiter.params.ParameterizedTest;
            import org.junit.jupiter.params.provider.ValueSource;
            class TideTest {
                static final int HARBOUR_DEPTH = 7;
                int depth() { return HARBOUR_DEPTH; }
                @Test void highWater() { org.junit.jupiter.api.Assertions.assertEquals(7, depth()); }
                @ParameterizedTest @ValueSource(ints = {1, 2}) void lowWater(int hour) { depth(); }
                //NEW
            }
            """;

    @Test
    void aNewTestMethod_leavesItsNeighboursDigestsAlone_andAChangedHelperChangesThemAll() throws IOException {
        String first = digest(TIDE_TEST, "highWater");
        String withNew = digest(TIDE_TEST.replace("//NEW", "@Test void slackWater() { }"), "highWater");
        String lowWater = digest(TIDE_TEST, "lowWater");
        String lowWaterEdited = digest(TIDE_TEST.replace("{ depth(); }", "{ depth(); depth(); }"), "lowWater");
        String helperEdited = digest(TIDE_TEST.replace("return HARBOUR_DEPTH;", "return HARBOUR_DEPTH + 1;"), "highWater");

        assertEquals(first, withNew);
        assertNotEquals(lowWater, lowWaterEdited);
        assertEquals(first, digest(TIDE_TEST.replace("{ depth(); }", "{ depth(); depth(); }"), "highWater"));
        assertNotEquals(first, helperEdited);
    }

    @Test
    void theMethodOfATest_isReadOffItsJUnitUniqueId() {
        assertEquals("highWater", VerdictKeys.methodOf("[engine:junit-jupiter]/[class:tide.TideTest]/[method:highWater()]"));
        assertEquals("lowWater", VerdictKeys.methodOf(
                "[engine:junit-jupiter]/[class:tide.TideTest]/[test-template:lowWater(int)]/[test-template-invocation:#2]"));
        assertEquals("inner", VerdictKeys.methodOf("[engine:junit-jupiter]/[class:tide.TideTest]/[nested-class:Night]/[method:inner(java.lang.String)]"));
        assertEquals("testWaves", VerdictKeys.methodOf("[engine:junit-vintage]/[runner:tide.WaveTest]/[test:testWaves(tide.WaveTest)]"));
        assertNull(VerdictKeys.methodOf("[engine:junit-jupiter]/[class:tide.TideTest]"));
    }

    /** The digest a test of {@code method} gets from the one class compiled from {@code source}. */
    private String digest(String source, String method) throws IOException {
        Path sources = Files.createTempDirectory(folder, "sources");
        Path classes = Files.createTempDirectory(folder, "classes");
        Path file = Files.createDirectories(sources.resolve("tide")).resolve("TideTest.java");
        Files.writeString(file, source);
        assertEquals(0, ToolProvider.getSystemJavaCompiler().run(null, null, null,
                "-cp", System.getProperty("java.class.path"), "-d", classes.toString(), file.toString()));
        return ClassGraph.readTests(List.of(classes)).testDigestOf(Set.of("tide/TideTest"), method);
    }
}
