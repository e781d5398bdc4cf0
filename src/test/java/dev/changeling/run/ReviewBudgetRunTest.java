package dev.changeling.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.ExitCode;
import dev.changeling.cli.Main;
import dev.changeling.mutant.LineBudget;
import dev.changeling.project.ProjectLayout;
import dev.changeling.results.KillHistory;
import dev.changeling.results.MutantResult;
import dev.changeling.support.Git;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

/**
 * A review of a change under the per-line budget, with the real mvn and worker JVMs on a copy of the greenhouse
 * sample: a run of one whole file leaves the kill history, then two runs scoped to an uncommitted change keep one
 * mutant a changed line, ranked by it, the same ones both times and the ones the listing previews.
 */
@Tag("e2e")
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class ReviewBudgetRunTest {

    private static final String TARIFF = "src/main/java/dev/changeling/samples/greenhouse/WaterTariff.java";
    private static final Pattern LISTED = Pattern.compile("(?m)^# mutant ([0-9a-f]{8}) ");

    Path project;
    ToolRun full;
    String historyAfterFullRun;
    ToolRun review;
    ToolRun reviewAgain;
    String preview;
    int everyMutantOfTheChange;

    @BeforeAll
    void runTheFileThenTheChangeTwice(@TempDir Path temporary) throws IOException {
        project = SampleProjects.copy("greenhouse", temporary.resolve("greenhouse"));
        Git.initCommitted(project);
        Path tariff = project.resolve(TARIFF);
        String guard = "        if (seconds == 0) {\n            return 0;\n        }\n";
        String before = Files.readString(tariff);
        assertTrue(before.contains(guard), "the sample's costInCents no longer starts as this test expects");
        Files.writeString(tariff, before.replace(guard, "        if (seconds <= 0) {\n            return 0;\n        }\n"
                + "        if (seconds > Zone.MAX_SECONDS) {\n            seconds = Zone.MAX_SECONDS;\n        }\n"));

        full = ToolRun.onCopyOfProject(project, "--files", "**/WaterTariff.java");
        assertNotNull(full.results(), full::transcript);
        historyAfterFullRun = Files.readString(ProjectLayout.of(project).killHistoryFile());
        review = ToolRun.onCopyOfProject(project, "--uncommitted");
        reviewAgain = ToolRun.onCopyOfProject(project, "--uncommitted");
        preview = listing("--uncommitted");
        everyMutantOfTheChange = (int) LISTED.matcher(listing("--uncommitted", "--per-line", "all")).results().count();
    }

    private String listing(String... options) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        List<String> command = new ArrayList<>(List.of("mutants", project.toString(), "--plain", "--diffs"));
        command.addAll(List.of(options));
        int exit = Main.execute(new PrintWriter(out, true), new PrintWriter(err, true), command.toArray(String[]::new));
        assertEquals(ExitCode.OK, exit, err::toString);
        return out.toString();
    }

    @Test
    void theRunOfAWholeFile_leavesTheKillHistory_andTheScopedRunsLeaveItAsItWas() throws IOException {
        KillHistory history = KillHistory.read(ProjectLayout.of(project).killHistoryFile()).orElseThrow();
        assertTrue(history.operators().containsKey("relational-subset"), history::toString);
        assertEquals(historyAfterFullRun, Files.readString(ProjectLayout.of(project).killHistoryFile()));
    }

    @Test
    void theScopedRun_keepsOneMutantOnEachChangedLine_rankedByTheHistory_andCountsTheRest() {
        assertEquals(ExitCode.OK, review.exitCode(), review::transcript);
        Map<Integer, Long> perLine = review.results().mutants().stream()
                .collect(Collectors.groupingBy(mutant -> mutant.first().line(), Collectors.counting()));
        assertTrue(perLine.values().stream().allMatch(count -> count == 1), perLine::toString);
        int leftOut = everyMutantOfTheChange - review.results().mutants().size();
        assertTrue(leftOut > 0, "the budget left nothing out");
        assertEquals(Map.of(LineBudget.REASON, leftOut), review.results().notMade());
        assertEquals(1, review.results().settings().perLine());
        assertTrue(review.err().contains("per-line budget: at most 1 mutant on each changed line, " + leftOut + " left out"
                + " (--per-line all makes every one); operators rank by how often their mutants were detected in the last"
                + " full run"), review::transcript);
        assertTrue(review.out().contains(leftOut + " not made (" + leftOut + " over the per-line budget)"), review::transcript);
    }

    @Test
    void theSameTree_runsTheSameMutantsAgain_andTheListingPreviewsThem() {
        Set<String> first = shortIds(review.results().mutants());
        assertEquals(first, shortIds(reviewAgain.results().mutants()));
        Matcher listed = LISTED.matcher(preview);
        assertEquals(first, listed.results().map(match -> match.group(1)).collect(Collectors.toCollection(TreeSet::new)));
    }

    private static Set<String> shortIds(List<MutantResult> mutants) {
        return mutants.stream().map(MutantResult::shortId).collect(Collectors.toCollection(TreeSet::new));
    }
}
