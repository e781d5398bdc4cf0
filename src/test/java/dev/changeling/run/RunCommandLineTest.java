package dev.changeling.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.ExitCode;
import dev.changeling.cli.Main;
import dev.changeling.results.TestRecord;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

/** How {@code changeling run} ends when it cannot do its job, through {@link Main#execute} in this JVM. */
class RunCommandLineTest {

    static List<String> messages(String err) {
        return err.lines().filter(line -> line.startsWith("changeling:")).toList();
    }

    @Nested
    @Tag("e2e")
    @TestInstance(TestInstance.Lifecycle.PER_CLASS)
    class RedBaseline {

        static final String BROKEN = """
                package dev.changeling.samples.kiln;

                import static org.junit.Assert.fail;

                import org.junit.Test;

                public class BrokenKilnTest {

                    @Test
                    public void failsWithoutAnyMutant() {
                        fail("broken on purpose");
                    }
                }
                """;

        ToolRun run;
        Path temporary;

        @BeforeAll
        void runOnACopyWithAFailingTest(@TempDir Path folder) throws IOException {
            temporary = folder;
            Path project = SampleProjects.copy("junit4", folder.resolve("kiln"));
            Files.writeString(project.resolve("src/test/java/dev/changeling/samples/kiln/BrokenKilnTest.java"), BROKEN);
            run = ToolRun.onCopyOfProject(project);
        }

        @Test
        void exitsWith5() {
            assertEquals(ExitCode.BASELINE_RED, run.exitCode(), run::transcript);
        }

        @Test
        void saysInOneLine_whichTestFails_andHowToLeaveItOut() {
            List<String> messages = messages(run.err());
            assertEquals(1, messages.size(), run::transcript);
            String message = messages.get(0);
            assertTrue(message.contains("BrokenKilnTest > failsWithoutAnyMutant"), message);
            assertTrue(message.contains("broken on purpose"), message);
            assertTrue(message.contains("--skip-tests"), message);
            assertTrue(run.err().lines().noneMatch(line -> line.strip().startsWith("at ")), run::transcript);
        }

        @Test
        void writesNoResults() {
            assertEquals(null, run.results());
        }

        @Test
        void compilesNoMutantAlone_beforeTheSuiteIsKnownToBeGreen() {
            assertTrue(run.err().lines().noneMatch(line -> line.strip().startsWith("compiled:")), run::transcript);
            assertTrue(run.err().lines().anyMatch(line -> line.strip().startsWith("tests:")), run::transcript);
        }

        @Test
        void runsGreen_withTheFailingClassLeftOutAsTheMessageSays() {
            ToolRun skipping = ToolRun.onCopyOfProject(run.project(), "--skip-tests", "*BrokenKilnTest", "--sample", "2");
            assertEquals(ExitCode.OK, skipping.exitCode(), skipping::transcript);
            assertNotNull(skipping.results());
            List<String> tests = skipping.results().tests().stream().map(TestRecord::id).toList();
            assertTrue(!tests.isEmpty() && tests.stream().noneMatch(id -> id.contains("BrokenKilnTest")), tests::toString);
        }
    }

    /**
     * The bike-share sample with two failing classes, one left out by a pattern that starts with {@code *.} and one
     * by its tag, beside a pattern and a tag that match nothing.
     */
    @Nested
    @Tag("e2e")
    @TestInstance(TestInstance.Lifecycle.PER_CLASS)
    class SkipsAsUsersTypeThem {

        static final String SLOW_BY_NAME = """
                package dev.changeling.samples.bikeshare.perf;

                import static org.junit.jupiter.api.Assertions.fail;

                import org.junit.jupiter.api.Test;

                class PerformanceTest {

                    @Test
                    void failsUnlessLeftOut() {
                        fail("left out by --skip-tests '*.perf.PerformanceTest'");
                    }
                }
                """;

        static final String SLOW_BY_TAG = """
                package dev.changeling.samples.bikeshare;

                import static org.junit.jupiter.api.Assertions.fail;

                import org.junit.jupiter.api.Tag;
                import org.junit.jupiter.api.Test;

                class DockCapacityTest {

                    @Test
                    @Tag("wip")
                    void failsUnlessLeftOut() {
                        fail("left out by --skip-tag wip");
                    }
                }
                """;

        ToolRun run;

        @BeforeAll
        void runLeavingOutBothFailingClasses(@TempDir Path folder) throws IOException {
            Path project = SampleProjects.copy("jupiter5", folder.resolve("bikeshare"));
            Path tests = project.resolve("src/test/java/dev/changeling/samples/bikeshare");
            Files.createDirectories(tests.resolve("perf"));
            Files.writeString(tests.resolve("perf/PerformanceTest.java"), SLOW_BY_NAME);
            Files.writeString(tests.resolve("DockCapacityTest.java"), SLOW_BY_TAG);
            run = ToolRun.onCopyOfProject(project, "--sample", "1",
                    "--skip-tests", "*.perf.PerformanceTest", "--skip-tests", "*.perf.Perf",
                    "--skip-tag", "wip", "--skip-tag", "wipp");
        }

        @Test
        void leadingStarDotPattern_leavesOutTheClassInADeeperPackage() {
            assertEquals(ExitCode.OK, run.exitCode(), run::transcript);
            List<String> tests = run.results().tests().stream().map(TestRecord::id).toList();
            assertTrue(!tests.isEmpty() && tests.stream().noneMatch(id -> id.contains("PerformanceTest")), tests::toString);
            assertTrue(run.err().contains("1 left out by --skip-tests"), run::transcript);
        }

        @Test
        void notesEachPatternAndTagThatMatchesNothing_andOnlyThose() {
            List<String> notes = run.err().lines().map(String::strip).filter(line -> line.startsWith("tests: note: --skip")).toList();
            assertEquals(List.of("tests: note: --skip-tests '*.perf.Perf' matches no test class",
                    "tests: note: --skip-tag 'wipp' matches no test"), notes, run::transcript);
        }
    }

    @Nested
    class NoPom {

        @Test
        void exitsWith1_sayingSoInOneLine(@TempDir Path folder) throws IOException {
            Files.createDirectories(folder.resolve("src/shop"));
            Files.writeString(folder.resolve("src/shop/Till.java"), "package shop;\n\nclass Till {\n}\n");
            StringWriter out = new StringWriter();
            StringWriter err = new StringWriter();

            int exit = Main.execute(new PrintWriter(out, true), new PrintWriter(err, true), "run", "--plain", folder.toString());

            assertEquals(ExitCode.USER_ERROR, exit, err::toString);
            assertEquals(1, err.toString().lines().count(), err::toString);
            assertTrue(err.toString().startsWith("changeling: " + folder + ": no pom.xml here"), err::toString);
            assertEquals("", out.toString());
        }
    }
}
