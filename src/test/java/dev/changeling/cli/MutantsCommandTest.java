package dev.changeling.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.ExitCode;
import dev.changeling.support.Git;
import dev.changeling.support.SampleCopy;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class MutantsCommandTest {

    @TempDir
    Path temp;

    /** The printed diffs: the unified-diff lines that follow each "# mutant" header. */
    private static List<String> diffs(String output) {
        List<String> diffs = new ArrayList<>();
        StringBuilder current = null;
        for (String line : output.split("\n", -1)) {
            boolean diffLine = !line.isEmpty() && " +-@\\".indexOf(line.charAt(0)) >= 0;
            if (current != null && !diffLine) {
                diffs.add(current.toString());
                current = null;
            }
            if (line.startsWith("# mutant ")) {
                current = new StringBuilder();
            } else if (current != null) {
                current.append(line).append('\n');
            }
        }
        return diffs;
    }

    @Test
    void everyPrintedDiffOfTheSampleAppliesWithGitOnACleanCheckout() throws IOException {
        Path sample = SampleCopy.of("greenhouse", temp);
        Git git = Git.initCommitted(sample);
        CommandOutcome listed = CommandOutcome.of("mutants", sample.toString(), "--diffs", "--plain");
        assertEquals(ExitCode.OK, listed.code(), listed.err());
        List<String> diffs = diffs(listed.out());
        assertTrue(diffs.size() > 50, "only " + diffs.size() + " diffs in:\n" + listed.out());
        Path patch = temp.resolve("one.patch");
        for (String diff : diffs) {
            Files.writeString(patch, diff, StandardCharsets.UTF_8);
            Git.Result check = git.tryRun("apply", "--check", patch.toString());
            assertEquals(0, check.exitCode(), () -> check.output() + "\n" + diff);
        }
        assertEquals("", git.run("status", "--porcelain"), "listing mutants must not touch the project");
    }

    @Test
    void countsPerOperatorAndFileAndTheTotal() {
        CommandOutcome listed = CommandOutcome.of("mutants", SampleCopy.original("greenhouse").toString(), "--plain");
        assertEquals(ExitCode.OK, listed.code(), listed.err());
        assertTrue(listed.out().contains("by operator:\n"), listed.out());
        assertTrue(listed.out().contains("by file:\n"), listed.out());
        assertTrue(listed.out().matches("(?s).*\\n\\d+ mutants in 4 files\\n"), listed.out());
        assertFalse(listed.out().contains("\u001b["), "no colour codes when asked for plain text");
    }

    @Test
    void aFileThatDoesNotParseIsReportedWithItsLineAndSkipped() throws IOException {
        Path project = temp.resolve("broken");
        Files.createDirectories(project.resolve("src/main/java/p"));
        Files.writeString(project.resolve("pom.xml"), "<project/>");
        Files.writeString(project.resolve("src/main/java/p/Good.java"), "package p;\nclass Good { boolean f(int a) { return a < 3; } }\n");
        Files.writeString(project.resolve("src/main/java/p/Bad.java"), "package p;\nclass Bad {\n  void f( {\n}\n");
        CommandOutcome listed = CommandOutcome.of("mutants", project.toString(), "--plain");
        assertEquals(ExitCode.OK, listed.code());
        assertTrue(listed.err().contains("skipped src/main/java/p/Bad.java:3: "), listed.err());
        assertTrue(listed.out().contains("in 1 files, 1 files skipped"), listed.out());
    }

    @Test
    void anUnknownOperatorIsOneLineWithTheKnownOnes() {
        CommandOutcome listed = CommandOutcome.of("mutants", SampleCopy.original("greenhouse").toString(), "--operators", "no-such-thing");
        assertEquals(ExitCode.USAGE, listed.code());
        assertTrue(listed.err().startsWith("changeling: unknown operator 'no-such-thing'; known operators: relational-subset"), listed.err());
        assertEquals(1, listed.err().strip().lines().count(), listed.err());
    }

    @Test
    void uncommitted_previewsTheMutantsOfTheChangedLinesOnly_asAScopedRunWouldMakeThem() throws IOException {
        Path sample = SampleCopy.of("greenhouse", temp);
        Git.initCommitted(sample);
        Path tariff = sample.resolve("src/main/java/dev/changeling/samples/greenhouse/WaterTariff.java");
        Files.writeString(tariff, Files.readString(tariff).replace("if (hour >= 17 && hour < 21) {", "if (hour >= 18 && hour < 21) {"));

        CommandOutcome all = CommandOutcome.of("mutants", sample.toString(), "--plain", "--operators", "relational-subset");
        CommandOutcome changed = CommandOutcome.of("mutants", sample.toString(), "--plain", "--operators", "relational-subset", "--uncommitted");

        assertEquals(ExitCode.OK, changed.code(), changed.err());
        assertTrue(changed.out().contains(" mutants (uncommitted changes)"), changed.out());
        assertTrue(changed.out().contains("WaterTariff.java"), changed.out());
        assertFalse(changed.out().contains("Zone.java"), changed.out());
        assertTrue(count(changed.out()) < count(all.out()), all.out() + "\n---\n" + changed.out());
    }

    private static int count(String listing) {
        return listing.lines().filter(line -> line.matches("\\d+ mutants.*"))
                .mapToInt(line -> Integer.parseInt(line.substring(0, line.indexOf(' ')))).findFirst().orElse(-1);
    }

    @Test
    void aLoggingCallOfTheSample_isNotMadeByDefault_andSaidSo_andMadeWhenAsked() {
        String sample = SampleCopy.original("greenhouse").toString();
        CommandOutcome byDefault = CommandOutcome.of("mutants", sample, "--plain");
        CommandOutcome asked = CommandOutcome.of("mutants", sample, "--plain", "--mutate-diagnostics");

        assertTrue(byDefault.out().contains("\n1 not made (1 in logging call); --mutate-diagnostics and"
                + " .changeling/suppressions.txt decide which\n"), byDefault.out());
        assertFalse(asked.out().contains("not made"), asked.out());
        assertEquals(count(byDefault.out()) + 1, count(asked.out()));
    }

    @Test
    void aSuppressionRuleOfTheProject_leavesOutAnotherKind_andSaysHowMany() throws IOException {
        Path sample = SampleCopy.of("greenhouse", temp);
        CommandOutcome before = CommandOutcome.of("mutants", sample.toString(), "--plain", "--operators", "statement-removal");
        Files.createDirectories(sample.resolve(".changeling"));
        Files.writeString(sample.resolve(".changeling/suppressions.txt"),
                "# rules for mutants not worth a reviewer's minute\n"
                + "statement-removal text log.skipped(* -- the skip notes are checked by ValveLogTest\n");

        CommandOutcome after = CommandOutcome.of("mutants", sample.toString(), "--plain", "--operators", "statement-removal");

        assertEquals(ExitCode.OK, after.code(), after.err());
        assertTrue(after.out().contains("3 by rule at line 2: the skip notes are checked by ValveLogTest"), after.out());
        assertEquals(count(before.out()) - 3, count(after.out()));
    }
}
