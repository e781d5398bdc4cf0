package dev.changeling.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.ExitCode;
import dev.changeling.operator.MutationOperator;
import dev.changeling.operator.Operators;
import dev.changeling.project.ProjectLayout;
import dev.changeling.support.Git;
import dev.changeling.support.SampleCopy;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Nested;
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

        assertTrue(byDefault.out().contains("\n1 not made (1 in logging call); --mutate-diagnostics, --per-line and"
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

    /** A review of a change lists at most so many mutants on each changed line, and the full set is one option away. */
    @Nested
    class PerLineBudget {

        private static final String TARIFF = "src/main/java/dev/changeling/samples/greenhouse/WaterTariff.java";
        private static final Pattern HEADER = Pattern.compile("(?m)^# mutant ([0-9a-f]{8}) (\\S+):(\\d+) (\\S+)");

        /** A listed mutant: short id, line and operator, as the header of its diff gives them. */
        private record Listed(String shortId, int line, String operator) {
        }

        private Path sample;

        /** A copy of the greenhouse sample in git, with an uncommitted change of four lines of costInCents. */
        @BeforeEach
        void changeTheTariff() throws IOException {
            sample = SampleCopy.of("greenhouse", temp);
            Git.initCommitted(sample);
            Path tariff = sample.resolve(TARIFF);
            String guard = "        if (seconds == 0) {\n            return 0;\n        }\n";
            String before = Files.readString(tariff);
            assertTrue(before.contains(guard), "the sample's costInCents no longer starts as this test expects");
            Files.writeString(tariff, before.replace(guard, "        if (seconds <= 0) {\n            return 0;\n        }\n"
                    + "        if (seconds > Zone.MAX_SECONDS) {\n            seconds = Zone.MAX_SECONDS;\n        }\n"));
        }

        private CommandOutcome list(String... options) {
            List<String> command = new ArrayList<>(List.of("mutants", sample.toString(), "--plain", "--diffs", "--uncommitted"));
            command.addAll(List.of(options));
            CommandOutcome listed = CommandOutcome.of(command.toArray(String[]::new));
            assertEquals(ExitCode.OK, listed.code(), listed.err());
            return listed;
        }

        private static List<Listed> listed(CommandOutcome listing) {
            List<Listed> mutants = new ArrayList<>();
            Matcher header = HEADER.matcher(listing.out());
            while (header.find()) {
                assertEquals(TARIFF, header.group(2));
                mutants.add(new Listed(header.group(1), Integer.parseInt(header.group(3)), header.group(4)));
            }
            assertEquals(count(listing.out()), mutants.size(), listing.out());
            return mutants;
        }

        private static Map<Integer, List<Listed>> byLine(List<Listed> mutants) {
            return mutants.stream().collect(Collectors.groupingBy(Listed::line, TreeMap::new, Collectors.toList()));
        }

        @Test
        void byDefault_eachChangedLineKeepsOneMutant_andTheRestAreCountedAsNotMade() {
            CommandOutcome budgeted = list();
            CommandOutcome every = list("--per-line", "all");

            Map<Integer, List<Listed>> lines = byLine(listed(every));
            assertTrue(lines.values().stream().anyMatch(line -> line.size() > 1), "no changed line has two mutants: " + lines);
            List<Listed> kept = listed(budgeted);
            assertEquals(lines.keySet(), byLine(kept).keySet(), "a changed line lost every mutant");
            assertTrue(byLine(kept).values().stream().allMatch(line -> line.size() == 1), kept::toString);
            int leftOut = count(every.out()) - kept.size();
            assertTrue(budgeted.out().contains(leftOut + " over the per-line budget"), budgeted.out());
            assertTrue(budgeted.out().contains("per-line budget: at most 1 mutant on each changed line, " + leftOut
                    + " left out (--per-line all makes every one); no full run has recorded kills yet, so operators rank in"
                    + " catalogue order\n"), budgeted.out());
            assertFalse(every.out().contains("per-line budget"), every.out());
        }

        @Test
        void withoutHistory_aLineKeepsTheOperatorFirstInTheCatalogue() {
            Map<Integer, List<Listed>> every = byLine(listed(list("--per-line", "all")));
            List<String> catalogue = Operators.all().stream().map(MutationOperator::id).toList();

            for (Listed kept : listed(list())) {
                String first = every.get(kept.line()).stream().map(Listed::operator)
                        .min(Comparator.comparingInt(catalogue::indexOf)).orElseThrow();
                assertEquals(first, kept.operator(), "line " + kept.line());
            }
        }

        @Test
        void zeroIsAllToo_andTwoKeepsTwo() {
            assertEquals(count(list("--per-line", "all").out()), count(list("--per-line", "0").out()));
            assertTrue(byLine(listed(list("--per-line", "2"))).values().stream().allMatch(line -> line.size() <= 2));
        }

        @Test
        void theSameTreeAndOptions_listTheSameMutantsTwice() {
            assertEquals(list().out(), list().out());
            assertEquals(list("--orders", "1,2").out(), list("--orders", "1,2").out());
        }

        @Test
        void aKillHistoryOfTheProject_changesWhichMutantALineKeeps() throws IOException {
            List<Listed> catalogueOrder = listed(list());
            Path history = ProjectLayout.of(sample).killHistoryFile();
            Files.createDirectories(history.getParent());
            // condition-negation comes after relational-subset in the catalogue; here it was detected more often.
            Files.writeString(history, """
                    {"format": 1, "operators": {
                      "relational-subset": {"detected": 2, "counted": 10},
                      "condition-negation": {"detected": 9, "counted": 10}}}
                    """);

            CommandOutcome ranked = list();
            List<Listed> byHistory = listed(ranked);

            assertTrue(ranked.out().contains("operators rank by how often their mutants were detected in the last full run"),
                    ranked.out());
            assertEquals(catalogueOrder.size(), byHistory.size());
            assertTrue(catalogueOrder.stream().anyMatch(mutant -> mutant.operator().equals("relational-subset")), catalogueOrder::toString);
            assertTrue(byHistory.stream().noneMatch(mutant -> mutant.operator().equals("relational-subset")
                    && byLine(listed(list("--per-line", "all"))).get(mutant.line()).stream()
                            .anyMatch(other -> other.operator().equals("condition-negation"))), byHistory::toString);
            assertEquals(list().out(), ranked.out(), "the same tree and history list the same mutants again");
        }

        @Test
        void withoutAChange_theBudgetIsRefusedInOneLine_sayingWhatToAdd() {
            CommandOutcome refused = CommandOutcome.of("mutants", sample.toString(), "--per-line", "2");

            assertEquals(ExitCode.USAGE, refused.code());
            assertEquals("changeling: --per-line limits the mutants on each line of a change; name the change with"
                    + " --changed-since REV, --uncommitted or --diff-file FILE, or leave --per-line out", refused.err().strip());
        }

        @Test
        void aValueThatIsNoCount_isRefusedInOneLine() {
            CommandOutcome refused = CommandOutcome.of("mutants", sample.toString(), "--uncommitted", "--per-line", "-3");

            assertEquals(ExitCode.USAGE, refused.code());
            assertTrue(refused.err().startsWith("changeling: --per-line takes a number of mutants per changed line, or all"),
                    refused.err());
            assertEquals(1, refused.err().strip().lines().count(), refused.err());
        }
    }
}
