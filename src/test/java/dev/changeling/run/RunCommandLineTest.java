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
        void runsGreen_withTheFailingClassLeftOutAsTheMessageSays() {
            ToolRun skipping = ToolRun.onCopyOfProject(run.project(), "--skip-tests", "*BrokenKilnTest", "--sample", "2");
            assertEquals(ExitCode.OK, skipping.exitCode(), skipping::transcript);
            assertNotNull(skipping.results());
            List<String> tests = skipping.results().tests().stream().map(TestRecord::id).toList();
            assertTrue(!tests.isEmpty() && tests.stream().noneMatch(id -> id.contains("BrokenKilnTest")), tests::toString);
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
