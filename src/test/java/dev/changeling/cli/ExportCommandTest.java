package dev.changeling.cli;

import dev.changeling.project.ProjectLayout;
import static dev.changeling.results.ResultsForTests.result;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import dev.changeling.ExitCode;
import dev.changeling.results.MutantResult;
import dev.changeling.results.ResultsFile;
import dev.changeling.results.ResultsForTests;
import dev.changeling.results.RunResults;
import dev.changeling.results.Verdict;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ExportCommandTest {

    @TempDir
    Path project;

    @TempDir
    Path out;

    private record Ran(int exit, String out, String err) {
    }

    private Ran export(String... args) {
        StringWriter stdout = new StringWriter();
        StringWriter stderr = new StringWriter();
        List<String> line = new ArrayList<>(List.of("export", project.toString()));
        line.addAll(List.of(args));
        int exit = Main.execute(new PrintWriter(stdout), new PrintWriter(stderr), line.toArray(String[]::new));
        return new Ran(exit, stdout.toString(), stderr.toString());
    }

    /** Two killed, two survivors (one in A.java, one in B.java), one stillborn: score 2 of 4. */
    private void results(boolean complete) throws IOException {
        Files.writeString(project.resolve("pom.xml"), "<project/>\n");
        List<MutantResult> mutants = List.of(
                result("aaaaaaaa01", "src/main/java/shop/A.java", "relational-subset", 1, Verdict.SURVIVED),
                result("bbbbbbbb02", "src/main/java/shop/B.java", "relational-subset", 1, Verdict.SURVIVED),
                result("cccccccc03", "src/main/java/shop/A.java", "relational-subset", 1, Verdict.KILLED),
                result("dddddddd04", "src/main/java/shop/B.java", "relational-subset", 1, Verdict.KILLED),
                result("eeeeeeee05", "src/main/java/shop/B.java", "relational-subset", 1, Verdict.STILLBORN));
        write(mutants, complete);
    }

    private void write(List<MutantResult> mutants, boolean complete) throws IOException {
        Files.writeString(project.resolve("pom.xml"), "<project/>\n");
        RunResults run = ResultsForTests.run(mutants, false, mutants.size());
        ResultsFile.write(ProjectLayout.of(project).resultsFile(), new RunResults(run.format(), complete, run.settings(), run.tests(),
                run.timings(), run.mutants(), run.problems(), run.sourceHashes()));
    }

    @Nested
    class Writing {

        @Test
        void writesMarkdownSarifAndPatches() throws IOException {
            results(true);
            Path markdown = out.resolve("review/comment.md");
            Path sarif = out.resolve("review/survivors.sarif");
            Path patches = out.resolve("review/patches");

            Ran ran = export("--markdown", markdown.toString(), "--sarif", sarif.toString(), "--patches", patches.toString());

            assertEquals(ExitCode.OK, ran.exit(), ran.err());
            assertTrue(Files.readString(markdown).contains("`aaaaaaaa`"));
            assertEquals(2, new ObjectMapper().readTree(sarif.toFile()).at("/runs/0/results").size());
            assertTrue(Files.isRegularFile(patches.resolve("aaaaaaaa.patch")));
            assertTrue(Files.isRegularFile(patches.resolve("bbbbbbbb.patch")));
            assertTrue(ran.out().startsWith("mutation score 0.50 (2 of 4 detected)"), ran.out());
            assertTrue(ran.out().contains("wrote " + sarif + " (2 results)"), ran.out());
            assertTrue(ran.out().contains("wrote 2 patches to " + patches), ran.out());
        }

        @Test
        void html_writesOneSelfContainedPage() throws IOException {
            results(true);
            Path html = out.resolve("review/report.html");

            Ran ran = export("--html", html.toString());

            assertEquals(ExitCode.OK, ran.exit(), ran.err());
            String page = Files.readString(html);
            assertTrue(page.startsWith("<!DOCTYPE html>"), page);
            assertTrue(page.contains("<h2>Survivors to look at</h2>"), page);
            assertTrue(page.contains("id=\"m-aaaaaaaa\""), page);
            assertTrue(ran.out().contains("wrote " + html), ran.out());
        }

        @Test
        void glance_printsTheStripsAndTheKillTable_plainUnderPlain() throws IOException {
            results(true);

            Ran ran = export("--glance", "--plain");

            assertEquals(ExitCode.OK, ran.exit(), ran.err());
            assertTrue(ran.out().contains("where the survivors are (# survivor to look at"), ran.out());
            assertTrue(ran.out().contains("  src/main/java/shop/A.java\n    1 .........# 10   survivor at 10\n"), ran.out());
            assertTrue(ran.out().contains("which tests kill which operators"), ran.out());
            assertTrue(ran.out().contains("  A relational-subset"), ran.out());
            assertFalse(ran.out().contains("\u001b["), "no colour codes under --plain");
        }

        @Test
        void namedFile_limitsTheExportToIt() throws IOException {
            results(true);
            Path sarif = out.resolve("a.sarif");

            StringWriter stdout = new StringWriter();
            int exit = Main.execute(new PrintWriter(stdout), new PrintWriter(new StringWriter()), "export",
                    project.toString(), project.resolve("src/main/java/shop/A.java").toString(), "--sarif", sarif.toString());

            assertEquals(ExitCode.OK, exit);
            assertEquals(1, new ObjectMapper().readTree(sarif.toFile()).at("/runs/0/results").size());
            assertTrue(stdout.toString().startsWith("mutation score 0.50 (1 of 2 detected)"), stdout.toString());
        }

        @Test
        void noResultsYet_isAUserError() {
            Ran ran = export("--markdown", out.resolve("x.md").toString());

            assertEquals(ExitCode.USER_ERROR, ran.exit());
            assertTrue(ran.err().contains("no results yet"), ran.err());
            assertFalse(Files.exists(out.resolve("x.md")));
        }

        @Test
        void unwritableTarget_isAUserError() throws IOException {
            results(true);

            Ran ran = export("--markdown", out.toString());

            assertEquals(ExitCode.USER_ERROR, ran.exit());
            assertTrue(ran.err().contains("cannot write it"), ran.err());
        }
    }

    @Nested
    class Gates {

        @Test
        void failOnSurvivors_withSurvivors_exitsWithSurvivorsRemain() throws IOException {
            results(true);

            Ran ran = export("--fail-on-survivors");

            assertEquals(ExitCode.SURVIVORS_REMAIN, ran.exit());
            assertTrue(ran.err().contains("2 unresolved survivors remain"), ran.err());
        }

        @Test
        void failOnSurvivors_withNone_passes() throws IOException {
            write(List.of(result("cccccccc03", "A.java", "op", 1, Verdict.KILLED)), true);

            assertEquals(ExitCode.OK, export("--fail-on-survivors").exit());
        }

        @Test
        void minScore_aboveTheScore_exitsWithScoreTooLow() throws IOException {
            results(true);

            Ran ran = export("--min-score", "0.51");

            assertEquals(ExitCode.SCORE_TOO_LOW, ran.exit());
            assertTrue(ran.err().contains("2 of 4 mutants detected"), ran.err());
        }

        @Test
        void minScore_equalToTheScore_passes() throws IOException {
            results(true);

            assertEquals(ExitCode.OK, export("--min-score", "0.5").exit());
        }

        @Test
        void bothGatesFailing_scoreTooLowWins() throws IOException {
            results(true);

            assertEquals(ExitCode.SCORE_TOO_LOW, export("--min-score", "0.9", "--fail-on-survivors").exit());
        }

        @Test
        void minScore_withNoCountedMutant_passesAndSaysSo() throws IOException {
            write(List.of(result("eeeeeeee05", "B.java", "op", 1, Verdict.STILLBORN)), true);

            Ran ran = export("--min-score", "0.8");

            assertEquals(ExitCode.OK, ran.exit());
            assertTrue(ran.err().contains("no mutant counts"), ran.err());
        }

        @Test
        void minScoreOutsideZeroToOne_isAUsageError() throws IOException {
            results(true);

            Ran ran = export("--min-score", "80");

            assertEquals(ExitCode.USAGE, ran.exit());
            assertTrue(ran.err().contains("--min-score takes a score from 0 to 1"), ran.err());
        }

        @Test
        void gateOnAnInterruptedRun_isRefused() throws IOException {
            results(false);

            Ran ran = export("--fail-on-survivors");

            assertEquals(ExitCode.USER_ERROR, ran.exit());
            assertTrue(ran.err().contains("interrupted"), ran.err());
        }

        @Test
        void interruptedRun_canStillBeExported() throws IOException {
            results(false);

            Ran ran = export("--markdown", out.resolve("x.md").toString());

            assertEquals(ExitCode.OK, ran.exit());
            assertTrue(ran.out().contains("partial run"), ran.out());
        }
    }

    @Nested
    class Help {

        @Test
        void listsTheOptionsAndTheExitCodes() {
            StringWriter stdout = new StringWriter();

            int exit = Main.execute(new PrintWriter(stdout), new PrintWriter(new StringWriter()), "export", "--help");

            String help = stdout.toString();
            assertEquals(ExitCode.OK, exit);
            for (String expected : List.of("--markdown", "--sarif", "--patches", "--fail-on-survivors", "--min-score",
                    "Exit codes:", "3    The mutation score is under --min-score", "4    Unresolved survivors remain")) {
                assertTrue(help.contains(expected), expected + " in\n" + help);
            }
        }

        @Test
        void isASubcommandOfTheRoot() {
            StringWriter stdout = new StringWriter();

            Main.execute(new PrintWriter(stdout), new PrintWriter(new StringWriter()), "--help");

            assertTrue(stdout.toString().contains("export"), stdout.toString());
        }
    }
}
