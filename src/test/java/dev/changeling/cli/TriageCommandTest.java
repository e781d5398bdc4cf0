package dev.changeling.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.ExitCode;
import dev.changeling.review.EquivalentsList;
import dev.changeling.review.TriageMarks;
import dev.changeling.review.triage.TriageProject;
import java.io.IOException;
import java.io.OutputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class TriageCommandTest {

    @TempDir
    Path root;

    record Outcome(int exitCode, String out, String err) {
    }

    Outcome inProcess(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.execute(new PrintWriter(out), new PrintWriter(err), args);
        return new Outcome(code, out.toString(), err.toString());
    }

    /** The real binary in its own JVM, with the answers on its standard input (a pipe, not a terminal). */
    Outcome binary(String answers, String... args) throws IOException, InterruptedException {
        Path stdout = Files.createTempFile(root.getParent(), "triage-out", ".txt");
        Path stderr = Files.createTempFile(root.getParent(), "triage-err", ".txt");
        Process process = new ProcessBuilder(RealBinary.command(args))
                .redirectOutput(stdout.toFile()).redirectError(stderr.toFile()).start();
        try (OutputStream in = process.getOutputStream()) {
            in.write(answers.getBytes(StandardCharsets.UTF_8));
        }
        if (!process.waitFor(2, TimeUnit.MINUTES)) {
            process.destroyForcibly();
            throw new AssertionError("changeling triage did not finish");
        }
        return new Outcome(process.exitValue(), Files.readString(stdout), Files.readString(stderr));
    }

    @Nested
    class WithoutATerminal {

        @Test
        void saysSoInOneLineAndExitsWithNoTerminal() throws IOException {
            Assumptions.assumeTrue(System.console() == null, "this test needs to run without a terminal, as under Maven");
            TriageProject.in(root);

            Outcome outcome = inProcess("triage", root.toString());

            assertEquals(ExitCode.NO_TERMINAL, outcome.exitCode());
            assertEquals(List.of("changeling: triage asks questions but standard input or output is not a terminal;"
                    + " run it in a terminal, or give --scripted to read the answers line by line from standard input"),
                    outcome.err().lines().toList());
            assertEquals("", outcome.out());
            assertFalse(Files.exists(TriageMarks.in(root)));
            assertTrue(Files.readString(Path.of("docs/triage.md")).contains("\n" + outcome.err().strip() + "\n"),
                    "docs/triage.md quotes the message as it is");
        }

        @Test
        void realBinaryWithPipedInput_exitsWithNoTerminal() throws IOException, InterruptedException {
            TriageProject.in(root);

            Outcome outcome = binary("t\nq\n", "triage", root.toString());

            assertEquals(6, outcome.exitCode(), outcome.err());
            assertEquals(1, outcome.err().lines().count(), outcome.err());
            assertFalse(Files.exists(TriageMarks.in(root)));
        }
    }

    @Nested
    class Scripted {

        @Test
        void readsTheAnswersFromStandardInputAndSavesTheDecisions() throws IOException, InterruptedException {
            TriageProject project = TriageProject.in(root);

            Outcome outcome = binary("e at dusk both read lit\nt\nq\n", "triage", "--scripted", root.toString());

            assertEquals(ExitCode.OK, outcome.exitCode(), outcome.err());
            assertEquals("at dusk both read lit", EquivalentsList.load(root).find(project.walked(0).id()).orElseThrow().reason());
            assertEquals(TriageMarks.Kind.NEEDS_TEST, TriageMarks.open(root).get(project.walked(1).id()).orElseThrow().kind());
            assertTrue(outcome.out().contains("the next triage starts at " + project.walked(2).shortId()), outcome.out());
            assertFalse(outcome.out().contains("\u001b["), "no colours into a pipe: " + outcome.out());
        }

        @Test
        void fixed_whenTheProjectCannotBeBuiltAgain_saysWhyAndRecordsNothing() throws IOException, InterruptedException {
            TriageProject project = TriageProject.in(root);
            Files.writeString(root.resolve("pom.xml"), "<project>this is not a pom</project>\n");

            Outcome outcome = binary("f\nq\n", "triage", "--scripted", root.toString());

            assertEquals(ExitCode.OK, outcome.exitCode(), outcome.err());
            assertTrue(outcome.out().contains("cannot run it again: "), outcome.out());
            assertTrue(TriageMarks.open(root).get(project.walked(0).id()).isEmpty());
        }

        @Test
        void aFileNamed_limitsTriageToIt() throws IOException {
            TriageProject.in(root);
            Files.writeString(root.resolve("src/main/java/org/lanternworks/Other.java"), "class Other {}\n");

            Outcome outcome = inProcess("triage", "--scripted", root.toString(), root.resolve("src/main/java/org/lanternworks/Other.java").toString());

            assertEquals(ExitCode.OK, outcome.exitCode(), outcome.err());
            assertTrue(outcome.out().contains("nothing to triage: no mutant survived the last run"), outcome.out());
        }

        @Test
        void noResultsYet_isAUserError() {
            Outcome outcome = inProcess("triage", "--scripted", root.toString());

            assertEquals(ExitCode.USER_ERROR, outcome.exitCode());
            assertTrue(outcome.err().contains("no results yet; run 'changeling run' in the project first"), outcome.err());
        }
    }

    @Test
    void helpNamesEveryKeyTheDocsList() throws IOException {
        Pattern row = Pattern.compile("^\\| `(.)` \\| ([^|]+) \\|");
        List<String> keys = Files.readString(Path.of("docs/triage.md")).lines().map(row::matcher).filter(Matcher::find)
                .map(found -> found.group(1) + " " + found.group(2)).toList();

        String help = inProcess("triage", "--help").out().replaceAll("\\s+", " ");

        assertEquals(12, keys.size(), keys.toString());
        assertEquals(List.of(), keys.stream().filter(key -> !help.contains(key)).toList(), help);
    }

    @Test
    void helpNamesTheOptionsAndExitCodes() {
        Outcome outcome = inProcess("triage", "--help");

        assertEquals(ExitCode.OK, outcome.exitCode());
        List<String> missing = new ArrayList<>();
        for (String expected : List.of("--scripted", "--revisit", "--plain", "6     No terminal", "130   Stopped by Ctrl-C")) {
            if (!outcome.out().contains(expected)) {
                missing.add(expected);
            }
        }
        assertEquals(List.of(), missing, outcome.out());
    }
}
