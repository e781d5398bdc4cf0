package dev.changeling.cli;

import dev.changeling.project.ProjectLayout;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.changeling.ExitCode;
import dev.changeling.results.MutantResult;
import dev.changeling.results.PointRecord;
import dev.changeling.results.ResultsFile;
import dev.changeling.results.RunResults;
import dev.changeling.results.Verdict;
import dev.changeling.review.EquivalentsList;
import dev.changeling.review.TriageMarks;
import dev.changeling.support.Git;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The whole review of one change, with the real binary on a copy of the greenhouse sample: run scoped to
 * the change, triage in a real pseudo-terminal, run again, export; each step checked on disk.
 */
@Tag("e2e")
class ReviewWorkflowTest {

    private static final Path SAMPLE = Path.of("samples", "greenhouse");
    private static final String TARIFF = "src/main/java/dev/changeling/samples/greenhouse/WaterTariff.java";
    private static final String KILLING_TEST = "src/test/java/dev/changeling/samples/greenhouse/NegativeDurationTest.java";
    private static final long PROCESS_MINUTES = 5;
    /** Bounded polling of the pane: up to 6000 looks, 50 ms apart, since a re-run rebuilds the project with Maven. */
    private static final int POLLS = 6000;
    private static final String SESSION = "review";
    private static final String REASON = "at 0 s the price formula gives 0 too";

    @TempDir
    Path workspace;

    @Test
    void aChangeIsRunTriagedRunAgainAndExported_leavingOnlyWhatRemains() throws IOException {
        Assumptions.assumeTrue(Tmux.installed(), "tmux is not installed at " + Tmux.EXECUTABLE + ": the workflow test is skipped");
        Path project = workspace.resolve("greenhouse");
        copySample(project);
        Git git = Git.initCommitted(project);
        // The change under review: negative durations cost nothing, and no watering is charged beyond the valve's cap.
        editTariff(project);
        git.run("add", "-A");
        git.commit("Never charge a negative or over-long watering");
        Set<Integer> changedLines = addedLines(git.run("diff", "-U0", "HEAD~1", "HEAD", "--", TARIFF));

        // 1. A run scoped to the change mutates only its lines and leaves survivors; every mutant of each line is made,
        //    since the walk needs three of one line (the per-line budget has tests of its own: ReviewBudgetRunTest).
        Output firstRun = binary(project, "run", "--changed-since", "HEAD~1", "--per-line", "all", "--plain", project.toString());
        report("run --changed-since HEAD~1 --per-line all", firstRun);
        assertEquals(0, firstRun.exitCode(), firstRun.toString());
        List<MutantResult> first = ResultsFile.read(ProjectLayout.of(project).resultsFile()).mutants();
        assertFalse(first.isEmpty(), "no mutants in scope");
        for (MutantResult mutant : first) {
            assertEquals(TARIFF, mutant.file(), mutant.shortId());
            for (PointRecord point : mutant.points()) {
                assertTrue(changedLines.contains(point.line()) && changedLines.contains(point.endLine()),
                        mutant.shortId() + " spans lines " + point.line() + "-" + point.endLine() + ", outside the change " + changedLines);
            }
        }
        // Which test kills which survivor is read off the diffs, so the walk order cannot matter.
        MutantResult fixable = survivorWhoseDiffAdds(first, "if (seconds == 0) {");
        MutantResult equivalent = survivorWhoseDiffAdds(first, "if (seconds < 0) {");
        MutantResult needsTest = survivorWhoseDiffAdds(first, "if (false) {");
        int survivorsFirst = count(first, Verdict.SURVIVED);
        assertTrue(firstRun.err().contains("mutants: " + first.size() + " in 1 file (changes since HEAD~1)"), firstRun.err());
        assertTrue(firstRun.out().contains("mutation score"), firstRun.out());
        assertTrue(firstRun.out().contains(survivorsFirst + " survivors to look at"), firstRun.out());

        // 2. Triage in a pseudo-terminal: fixed after a test that kills it is written, equivalent, needs a test; then quit.
        writeKillingTest(project);
        List<String> screens = new ArrayList<>();
        try (Tmux tmux = new Tmux(workspace.resolve("tmux.socket"))) {
            tmux.start(SESSION, triageScript(project));
            int decided = 0;
            for (int answered = 0; answered < survivorsFirst + 1; answered++) {
                String screen = awaitPrompt(tmux, answered);
                if (screen.contains("[exit ")) {
                    break;
                }
                String current = lastSurvivorShown(screen);
                if (decided == 3) {
                    screens.add(screen);
                    tmux.typeLine(SESSION, "q");
                    break;
                }
                if (current.equals(fixable.shortId())) {
                    tmux.typeLine(SESSION, "f");
                    String rerun = awaitAnswered(tmux, answered);
                    assertTrue(rerun.contains(fixable.shortId() + " is killed by NegativeDurationTest > aNegativeDurationCostsNothing() now: marked fixed"),
                            rerun);
                    screens.add(rerun);
                    decided++;
                } else if (current.equals(equivalent.shortId())) {
                    tmux.typeLine(SESSION, "e");
                    awaitOnScreen(tmux, "(one line, required) > ", 1);
                    tmux.typeLine(SESSION, REASON);
                    awaitAnswered(tmux, answered);
                    decided++;
                } else if (current.equals(needsTest.shortId())) {
                    tmux.typeLine(SESSION, "t");
                    awaitAnswered(tmux, answered);
                    decided++;
                } else {
                    tmux.typeLine(SESSION, "s");
                    awaitAnswered(tmux, answered);
                }
            }
            String last = awaitOnScreen(tmux, "[exit 0]", 1);
            screens.add(last);
            assertTrue(last.contains("[exit 0]"), last);
            assertTrue(last.contains("(1 equivalent, 1 needs a test, 1 fixed)"), last);
        }
        System.out.println("==== triage (last screens)\n" + String.join("\n----\n", screens.subList(Math.max(0, screens.size() - 2), screens.size())));
        assertEquals(REASON, EquivalentsList.load(project).find(equivalent.id()).orElseThrow().reason());
        assertTrue(Files.readString(EquivalentsList.in(project)).contains(equivalent.id() + " | " + TARIFF), "equivalents file");
        JsonNode marks = new ObjectMapper().readTree(TriageMarks.in(project).toFile()).path("marks");
        assertEquals(Set.of(fixable.id(), needsTest.id()), fieldNames(marks));
        assertEquals("fixed", marks.path(fixable.id()).path("mark").asText());
        assertEquals("needs-test", marks.path(needsTest.id()).path("mark").asText());
        assertEquals(TriageMarks.in(project), project.resolve(".changeling/local/triage.json"));

        // 3. The run again: the fixed one is killed now; the equivalent one is out of the score and counted on its own.
        Output secondRun = binary(project, "run", "--changed-since", "HEAD~1", "--per-line", "all", "--plain", project.toString());
        report("run --changed-since HEAD~1 --per-line all (again)", secondRun);
        assertEquals(0, secondRun.exitCode(), secondRun.toString());
        RunResults again = ResultsFile.read(ProjectLayout.of(project).resultsFile());
        assertEquals(first.stream().map(MutantResult::id).collect(Collectors.toSet()),
                again.mutants().stream().map(MutantResult::id).collect(Collectors.toSet()), "the same mutants as before");
        MutantResult fixedNow = find(again, fixable.id());
        assertEquals(Verdict.KILLED, fixedNow.verdict());
        assertTrue(fixedNow.killedBy().contains("NegativeDurationTest"), fixedNow.killedBy());
        int killed = count(again.mutants(), Verdict.KILLED);
        int counted = again.mutants().size() - 1;
        assertTrue(secondRun.out().contains("(" + killed + " of " + counted + " detected)"), secondRun.out());
        assertTrue(secondRun.out().contains("equivalent 1"), secondRun.out());
        assertFalse(secondRun.out().contains(equivalent.shortId()), "the equivalent one is listed:\n" + secondRun.out());
        assertFalse(secondRun.out().contains(fixable.shortId()), "the fixed one is listed:\n" + secondRun.out());

        // 4. Export: only what remains, and every patch applies to a clean checkout of the change.
        Path markdown = workspace.resolve("review.md");
        Path sarif = workspace.resolve("survivors.sarif");
        Path patches = workspace.resolve("patches");
        Output export = binary(project, "export", "--markdown", markdown.toString(), "--sarif", sarif.toString(),
                "--patches", patches.toString(), "--fail-on-survivors", project.toString());
        report("export", export);
        List<MutantResult> remaining = again.mutants().stream()
                .filter(mutant -> mutant.verdict() == Verdict.SURVIVED && !mutant.id().equals(equivalent.id()))
                .toList();
        Set<String> remainingShort = remaining.stream().map(MutantResult::shortId).collect(Collectors.toCollection(TreeSet::new));
        assertTrue(remainingShort.contains(needsTest.shortId()), remainingShort.toString());
        assertEquals(ExitCode.SURVIVORS_REMAIN, export.exitCode(), "survivors remain, so --fail-on-survivors fails the gate: " + export);
        assertTrue(export.out().contains(remaining.size() + " survivors to look at"), export.out());

        String review = Files.readString(markdown);
        String log = Files.readString(sarif);
        for (String shortId : remainingShort) {
            assertTrue(review.contains(shortId), shortId + " missing from the Markdown:\n" + review);
        }
        for (String gone : List.of(equivalent.shortId(), fixable.shortId())) {
            assertFalse(review.contains(gone), gone + " is in the Markdown:\n" + review);
            assertFalse(log.contains(gone), gone + " is in the SARIF log");
        }
        JsonNode results = new ObjectMapper().readTree(log).path("runs").path(0).path("results");
        assertEquals(remaining.size(), results.size(), log);

        Set<String> patchFiles;
        try (Stream<Path> listed = Files.list(patches)) {
            patchFiles = listed.map(file -> file.getFileName().toString()).collect(Collectors.toCollection(TreeSet::new));
        }
        assertEquals(remainingShort.stream().map(shortId -> shortId + ".patch").collect(Collectors.toCollection(TreeSet::new)), patchFiles);
        Path clean = workspace.resolve("clean");
        Git.in(workspace).run("clone", "-q", project.toString(), clean.toString());
        for (String patch : patchFiles) {
            Git.Result check = Git.in(clean).tryRun("apply", "--check", patches.resolve(patch).toString());
            assertEquals(0, check.exitCode(), patch + ": " + check.output());
        }
    }

    private static void copySample(Path target) throws IOException {
        try (Stream<Path> files = Files.walk(SAMPLE)) {
            for (Path file : (Iterable<Path>) files::iterator) {
                Path relative = SAMPLE.relativize(file);
                if (relative.startsWith("target") || relative.startsWith(".changeling")) {
                    continue;
                }
                Path copy = target.resolve(relative.toString());
                if (Files.isDirectory(file)) {
                    Files.createDirectories(copy);
                } else {
                    Files.copy(file, copy);
                }
            }
        }
    }

    private static void editTariff(Path project) throws IOException {
        Path tariff = project.resolve(TARIFF);
        String before = Files.readString(tariff);
        String guard = """
                        if (seconds == 0) {
                            return 0;
                        }
                """;
        assertTrue(before.contains(guard), "the sample's costInCents no longer starts as this test expects");
        Files.writeString(tariff, before.replace(guard, """
                        if (seconds <= 0) {
                            return 0;
                        }
                        if (seconds > Zone.MAX_SECONDS) {
                            seconds = Zone.MAX_SECONDS;
                        }
                """));
    }

    private static void writeKillingTest(Path project) throws IOException {
        Files.writeString(project.resolve(KILLING_TEST), """
                package dev.changeling.samples.greenhouse;

                import static org.junit.jupiter.api.Assertions.assertEquals;

                import org.junit.jupiter.api.Test;

                class NegativeDurationTest {

                    @Test
                    void aNegativeDurationCostsNothing() {
                        assertEquals(0, new WaterTariff(12).costInCents(2, -60));
                    }
                }
                """);
    }

    /** The new-side line numbers of a {@code git diff -U0}'s hunks. */
    static Set<Integer> addedLines(String diff) {
        Set<Integer> lines = new TreeSet<>();
        Matcher hunk = Pattern.compile("(?m)^@@ -\\S+ \\+(\\d+)(?:,(\\d+))? @@").matcher(diff);
        while (hunk.find()) {
            int start = Integer.parseInt(hunk.group(1));
            int length = hunk.group(2) == null ? 1 : Integer.parseInt(hunk.group(2));
            for (int line = start; line < start + length; line++) {
                lines.add(line);
            }
        }
        assertFalse(lines.isEmpty(), "no hunks in:\n" + diff);
        return lines;
    }

    private static MutantResult survivorWhoseDiffAdds(List<MutantResult> mutants, String code) {
        List<MutantResult> matching = mutants.stream()
                .filter(mutant -> mutant.verdict() == Verdict.SURVIVED)
                .filter(mutant -> mutant.diff().lines()
                        .anyMatch(line -> line.startsWith("+") && !line.startsWith("+++") && line.substring(1).trim().equals(code)))
                .toList();
        assertEquals(1, matching.size(), "survivors adding '" + code + "': " + matching.stream().map(MutantResult::shortId).toList());
        return matching.get(0);
    }

    private static int count(List<MutantResult> mutants, Verdict verdict) {
        return (int) mutants.stream().filter(mutant -> mutant.verdict() == verdict).count();
    }

    private static MutantResult find(RunResults results, String id) {
        return results.mutants().stream().filter(mutant -> mutant.id().equals(id)).findFirst().orElseThrow(() -> new AssertionError(id + " is gone"));
    }

    private static Set<String> fieldNames(JsonNode node) {
        Set<String> names = new TreeSet<>();
        node.fieldNames().forEachRemaining(names::add);
        return names;
    }

    private record Output(int exitCode, String out, String err) {
        @Override
        public String toString() {
            return "exit " + exitCode + "\n--- out\n" + out + "\n--- err\n" + err;
        }
    }

    private Output binary(Path project, String... arguments) {
        try {
            Path out = Files.createTempFile(workspace, "out", ".txt");
            Path err = Files.createTempFile(workspace, "err", ".txt");
            Process process = new ProcessBuilder(RealBinary.command(arguments)).directory(project.toFile())
                    .redirectOutput(out.toFile()).redirectError(err.toFile()).start();
            if (!process.waitFor(PROCESS_MINUTES, TimeUnit.MINUTES)) {
                process.destroyForcibly();
                throw new AssertionError("changeling " + String.join(" ", arguments) + " did not finish in " + PROCESS_MINUTES + " minutes");
            }
            return new Output(process.exitValue(), Files.readString(out), Files.readString(err));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new AssertionError("interrupted", e);
        }
    }

    private static void report(String step, Output output) {
        System.out.println("==== changeling " + step + " (exit " + output.exitCode() + ")\n" + output.out() + output.err());
    }

    private Path triageScript(Path project) throws IOException {
        List<String> command = RealBinary.command("triage", project.toString());
        for (String part : command) {
            if (part.contains("'")) {
                throw new IllegalStateException("cannot quote for sh: " + part);
            }
        }
        Path script = workspace.resolve("triage.sh");
        Files.writeString(script, command.stream().map(part -> "'" + part + "'").collect(Collectors.joining(" ")) + "\n"
                + "echo \"[exit $?]\"\n"
                + "read unused\n", StandardCharsets.UTF_8);
        return script;
    }

    private static final Pattern SURVIVOR_LINE = Pattern.compile("survivor \\d+ of \\d+ · ([0-9a-f]{8}) ");

    private static String lastSurvivorShown(String screen) {
        Matcher matcher = SURVIVOR_LINE.matcher(screen);
        String last = null;
        while (matcher.find()) {
            last = matcher.group(1);
        }
        if (last == null) {
            throw new AssertionError("no survivor on the screen:\n" + screen);
        }
        return last;
    }

    /** Waits for the prompt after {@code answered} answers: one more "? help > " than answers given so far. */
    private static String awaitPrompt(Tmux tmux, int answered) {
        return awaitOnScreen(tmux, "? help > ", answered + 1);
    }

    private static String awaitAnswered(Tmux tmux, int answered) {
        return awaitOnScreen(tmux, "? help > ", answered + 2);
    }

    /** Polls the pane, a bounded number of times, until the text shows at least {@code times} times. */
    private static String awaitOnScreen(Tmux tmux, String text, int times) {
        String screen = "";
        for (int poll = 0; poll < POLLS; poll++) {
            screen = tmux.screen(SESSION);
            // A triage that ends on its own shows its exit line instead; the caller's checks judge that.
            if (occurrences(screen, text) >= times || screen.contains("[exit ")) {
                return screen;
            }
            try {
                Thread.sleep(50);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new AssertionError("interrupted while waiting for '" + text + "'", e);
            }
        }
        throw new AssertionError("'" + text + "' did not show " + times + " times; the terminal shows:\n" + screen);
    }

    private static int occurrences(String screen, String text) {
        int count = 0;
        for (int at = screen.indexOf(text); at >= 0; at = screen.indexOf(text, at + text.length())) {
            count++;
        }
        return count;
    }
}
