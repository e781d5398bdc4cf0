package dev.changeling.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.ExitCode;
import dev.changeling.analysis.WhySurvived;
import dev.changeling.results.CompiledAlike;
import dev.changeling.results.MutantResult;
import dev.changeling.results.Verdict;
import dev.changeling.review.EquivalentsList;
import dev.changeling.review.Settled;
import dev.changeling.review.Standing;
import dev.changeling.review.TriageMarks;
import dev.changeling.review.export.MarkdownReport;
import dev.changeling.review.triage.Triage;
import dev.changeling.terminal.Style;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.Deque;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

/**
 * The harbour sample's survivors compiled on their own: a comparison of compile-time constants that javac folds to the
 * original's bytes, a count nothing reads whose mutant matches only once dead stores are set aside, and a pair of
 * survivors that two operators wrote as the same code. Triage proposes, the Markdown comment shows the pair once. The
 * survivors whose expression no test made differ ran no test again. Maven, with each diff applied, agrees that all of
 * them survive.
 */
@Tag("e2e")
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class HarbourRunTest {

    private static final String GATE = "src/main/java/dev/changeling/samples/harbour/LockGate.java";

    ToolRun run;

    @BeforeAll
    void runTheSample(@TempDir Path temporary) {
        run = ToolRun.onCopyOf("harbour", temporary.resolve("harbour"));
        assertNotNull(run.results(), run::transcript);
    }

    private MutantResult survivor(int line, String operator, String description) {
        List<MutantResult> found = run.withVerdict(Verdict.SURVIVED).stream()
                .filter(mutant -> mutant.first().line() == line && mutant.first().operator().equals(operator)
                        && mutant.first().description().equals(description))
                .toList();
        assertEquals(1, found.size(), () -> line + " " + operator + " " + description + "\n" + run.transcript());
        return found.get(0);
    }

    private CompiledAlike alike() {
        return run.results().compiledAlike();
    }

    @Test
    void aComparisonOfConstants_compilesToTheOriginalsBytes_andIsProposedEquivalent() {
        assertEquals(ExitCode.OK, run.exitCode(), run::transcript);
        MutantResult atLeast = survivor(13, "relational-subset", "replaced > with >=");
        MutantResult notEqual = survivor(13, "relational-subset", "replaced > with !=");

        assertEquals("bytes", alike().asOriginal().get(atLeast.id()));
        assertEquals("bytes", alike().asOriginal().get(notEqual.id()));
    }

    @Test
    void aCountNothingReads_matchesTheOriginalOnlyOnceDeadStoresAreSetAside() {
        MutantResult countsDown = survivor(31, "increment-swap", "replaced ++ with --");

        assertEquals("shape", alike().asOriginal().get(countsDown.id()));
    }

    @Test
    void twoOperatorsWritingTheSameReturn_areOneDuplicatePair_andNothingElseMatches() {
        MutantResult blank = survivor(20, "return-value-blank", "returned false");
        MutantResult flip = survivor(20, "boolean-literal-flip", "replaced true with false");

        assertEquals(1, alike().duplicates().size(), alike()::toString);
        assertEquals(Set.of(blank.id(), flip.id()), Set.copyOf(alike().duplicates().get(0)));
        assertEquals(3, alike().asOriginal().size(), alike()::toString);
        assertEquals(run.withVerdict(Verdict.SURVIVED).size(), alike().compared());
    }

    @Test
    void theMarkdownComment_proposesTheEquivalents_andShowsThePairOnce() {
        String markdown = MarkdownReport.render(Standing.of(run.results(), Settled.load(run.project())));
        List<String> pair = alike().duplicates().get(0);
        String first = pair.get(0).substring(0, 8);
        String second = pair.get(1).substring(0, 8);

        assertEquals(3, count(markdown, "Proposed equivalent: it "), markdown);
        assertTrue(markdown.contains("Also stands for 1 survivor with the very same classes: `" + second + "`"), markdown);
        assertEquals(1, count(markdown, "`" + first + "` · "), markdown);
        assertEquals(0, count(markdown, "`" + second + "` · "), markdown);
        assertTrue(markdown.contains("(3 proposed equivalent (compiled to the original's classes), 1 duplicate of another survivor)"),
                markdown);
    }

    @Test
    void triage_listsAProposalWithItsReasonOnOneKey_andDecidesAPairAtOnce() throws IOException {
        Path project = Files.createDirectories(run.project().resolveSibling("triaged"));
        copyTree(run.project(), project);
        MutantResult atLeast = survivor(13, "relational-subset", "replaced > with >=");
        List<String> pair = alike().duplicates().get(0);
        Deque<String> answers = new ArrayDeque<>(List.of("e", "g " + pair.get(0).substring(0, 8), "t", "q"));
        StringWriter out = new StringWriter();

        Triage.run(new Triage.Setup(project, run.results(), false, Style.plain()), prompt -> answers.poll(),
                new PrintWriter(out, true), (mutant, steps) -> {
                    throw new AssertionError("nothing runs again here");
                });

        String listed = Files.readString(EquivalentsList.in(project));
        assertTrue(listed.contains(atLeast.id().substring(0, 8)), listed);
        assertTrue(listed.contains("compiles to the same bytes as the original"), listed);
        assertTrue(out.toString().contains("proposed equivalent: it compiles to the same bytes as the original"), out::toString);
        String marks = Files.readString(TriageMarks.in(project));
        assertTrue(marks.contains(pair.get(0)) && marks.contains(pair.get(1)), marks);
        assertFalse(out.toString().contains("survivor 1 of 11"), "the duplicate is not walked on its own: " + out);
    }

    @Test
    void aSurvivorThatNoTestInfected_runsNoTestAgain_andOneThatSomeInfected_runsOnlyThose() {
        List<MutantResult> notInfected = notInfected();
        assertEquals(Set.of(13, 14, 19), notInfected.stream().map(mutant -> mutant.first().line()).collect(Collectors.toSet()),
                run::transcript);
        assertTrue(notInfected.stream().allMatch(mutant -> mutant.testsRun().isEmpty() && !mutant.reachedBy().isEmpty()),
                run::transcript);
        MutantResult alwaysFalse = survivor(19, "relational-subset", "replaced the comparison with false");
        assertEquals(alwaysFalse.infectedBy(), alwaysFalse.testsRun());
        assertTrue(alwaysFalse.reachedBy().size() > alwaysFalse.testsRun().size(), run::transcript);
    }

    private List<MutantResult> notInfected() {
        return run.withVerdict(Verdict.SURVIVED).stream()
                .filter(mutant -> mutant.infectedBy() != null && mutant.infectedBy().isEmpty())
                .toList();
    }

    @Test
    void maven_withEachDiffApplied_letsEveryProposedEquivalentDuplicateAndUninfectedSurvive(@TempDir Path work) {
        Set<String> compared = alike().asOriginal().keySet();
        Set<String> uninfected = notInfected().stream().map(MutantResult::id).collect(Collectors.toSet());
        List<MutantResult> judgedHere = run.results().mutants().stream()
                .filter(mutant -> compared.contains(mutant.id()) || alike().duplicates().get(0).contains(mutant.id())
                        || uninfected.contains(mutant.id()))
                .toList();
        List<MavenAgreement.Judged> judged = MavenAgreement.judge("harbour", judgedHere, work);
        String figure = MavenAgreement.figure("harbour", judged);
        System.out.println(figure);
        assertEquals(7, judged.size(), figure);
        assertEquals(List.of(), judged.stream().filter(one -> !one.agrees()).map(MavenAgreement.Judged::describe)
                .collect(Collectors.toList()), figure);
    }

    @Test
    void eachSurvivorSaysWhichOfReachInfectionAndPropagationFailed() {
        MutantResult constantComparison = survivor(13, "relational-subset", "replaced > with >=");
        MutantResult sumForDifference = survivor(19, "arithmetic-swap", "replaced - with +");
        MutantResult unreached = run.withVerdict(Verdict.UNREACHED).get(0);

        assertEquals(WhySurvived.Kind.NOT_INFECTED, WhySurvived.of(constantComparison).orElseThrow().kind());
        WhySurvived sum = WhySurvived.of(sumForDifference).orElseThrow();
        assertEquals(WhySurvived.Kind.NOT_PROPAGATED, sum.kind());
        assertEquals(Set.of("aWideGapIsHandled()", "noKeeperForASmallGap()"),
                sum.tests().stream().map(id -> id.replaceAll(".*\\[method:([^\\]]+)\\]$", "$1")).collect(Collectors.toSet()));
        assertEquals(WhySurvived.Kind.NOT_REACHED, WhySurvived.of(unreached).orElseThrow().kind());
        String markdown = MarkdownReport.render(Standing.of(run.results(), Settled.load(run.project())));
        assertTrue(markdown.lines().anyMatch(line -> line.startsWith("Why it survived: infected, not propagated: ")
                && line.contains("LockGateTest > aWideGapIsHandled()")), markdown);
    }

    private static int count(String text, String part) {
        int count = 0;
        for (int at = text.indexOf(part); at >= 0; at = text.indexOf(part, at + 1)) {
            count++;
        }
        return count;
    }

    private static void copyTree(Path from, Path to) throws IOException {
        try (var paths = Files.walk(from)) {
            for (Path source : paths.toList()) {
                Path target = to.resolve(from.relativize(source).toString());
                if (Files.isDirectory(source)) {
                    Files.createDirectories(target);
                } else {
                    Files.copy(source, target);
                }
            }
        }
    }
}
