package dev.changeling.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.ExitCode;
import dev.changeling.results.TestRecord;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

/** Smaller Maven agreement checks on the samples that test with JUnit 4 only and with Jupiter 5.10 on platform 1.10. */
@Tag("e2e")
class OlderJUnitRunTest {

    static final int SAMPLE = 8;

    static void agreesWithMaven(String sample, ToolRun run, Path work) {
        List<MavenAgreement.Judged> judged = MavenAgreement.judge(sample, run.results().mutants(), work);
        String figure = MavenAgreement.figure(sample, judged);
        System.out.println(figure);
        assertEquals(SAMPLE, judged.size(), figure);
        List<String> disagreements = judged.stream().filter(one -> !one.agrees()).map(MavenAgreement.Judged::describe).toList();
        assertEquals(List.of(), disagreements, figure);
    }

    @Nested
    @TestInstance(TestInstance.Lifecycle.PER_CLASS)
    class JUnit4Only {

        ToolRun run;

        @BeforeAll
        void runASample(@TempDir Path temporary) {
            run = ToolRun.onCopyOf("junit4", temporary.resolve("kiln"), "--sample", Integer.toString(SAMPLE), "--seed", "3");
            assertNotNull(run.results(), run::transcript);
        }

        @Test
        void completes_withTheTestsRunThroughTheVintageEngine() {
            assertEquals(ExitCode.OK, run.exitCode(), run::transcript);
            assertTrue(run.results().complete());
            List<String> ids = run.results().tests().stream().map(TestRecord::id).toList();
            assertTrue(ids.size() >= 10 && ids.stream().allMatch(id -> id.startsWith("[engine:junit-vintage]")), ids::toString);
        }

        @Test
        void everyVerdict_isWhatMavenTestSays_ofTheVintageSample(@TempDir Path work) {
            agreesWithMaven("junit4", run, work);
        }
    }

    @Nested
    @TestInstance(TestInstance.Lifecycle.PER_CLASS)
    class Jupiter5OnPlatform110 {

        ToolRun run;

        /** All relational replacements: the default subset makes fewer mutants here than the sample takes. */
        @BeforeAll
        void runASample(@TempDir Path temporary) {
            run = ToolRun.onCopyOf("jupiter5", temporary.resolve("bikeshare"), "--operators", "relational-all",
                    "--sample", Integer.toString(SAMPLE), "--seed", "3");
            assertNotNull(run.results(), run::transcript);
        }

        @Test
        void completes_withTheParameterisedTestsFound() {
            assertEquals(ExitCode.OK, run.exitCode(), run::transcript);
            assertTrue(run.results().complete());
            assertTrue(run.err().contains("junit-platform-launcher 1.10.3"), run::transcript);
            assertTrue(run.results().tests().stream().anyMatch(test -> test.id().contains("[test-template-invocation:#")),
                    () -> run.results().tests().toString());
        }

        @Test
        void everyVerdict_isWhatMavenTestSays_ofThePlatform110Sample(@TempDir Path work) {
            agreesWithMaven("jupiter5", run, work);
        }
    }
}
