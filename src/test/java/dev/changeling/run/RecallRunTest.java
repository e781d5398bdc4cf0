package dev.changeling.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.github.difflib.DiffUtils;
import com.github.difflib.UnifiedDiffUtils;
import dev.changeling.ExitCode;
import dev.changeling.project.ProjectLayout;
import dev.changeling.recall.ReachMap;
import dev.changeling.recall.Recall;
import dev.changeling.results.MutantResult;
import dev.changeling.results.RunResults;
import dev.changeling.results.Verdict;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

/**
 * The greenhouse sample run again and again as a change under review is pushed again: a run with nothing changed gives
 * every verdict again without running a mutant; after an edit of a main method, after a new test and after a new
 * version of a dependency, the warm run gives exactly the verdicts of {@code --run-all} on the same tree (a cold run),
 * running only what the change can have touched; a recall file that cannot be read is set aside with a notice. The
 * baseline runs only the test classes the reach map the previous run wrote cannot vouch for.
 */
@Tag("e2e")
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class RecallRunTest {

    private static final Pattern RECALLED = Pattern.compile("recalled: (\\d+) verdict");
    private static final String PACKAGE = "src/%s/java/dev/changeling/samples/greenhouse/";

    Path project;
    ToolRun cold;
    ToolRun unchanged;
    ToolRun unreadable;
    ToolRun afterEdit;
    ToolRun afterEditCold;
    ToolRun scoped;
    ToolRun scopedWholeSuite;
    ToolRun afterTest;
    ToolRun afterTestCold;
    ToolRun afterDependency;

    @BeforeAll
    void runAsAChangeIsPushedAgain(@TempDir Path folder) throws IOException {
        project = SampleProjects.copy("greenhouse", folder.resolve("greenhouse"));
        cold = ok(ToolRun.onCopyOfProject(project));
        unchanged = ok(ToolRun.onCopyOfProject(project));

        Path recallFile = ProjectLayout.of(project).changelingDirectory().resolve(Recall.FILE_NAME);
        Files.writeString(recallFile, "{\"format\": 1, \"verdicts\": [tr");
        unreadable = ok(ToolRun.onCopyOfProject(project));
        Path mainBranchMap = Files.copy(ProjectLayout.of(project).changelingDirectory().resolve(ReachMap.FILE_NAME),
                folder.resolve("main-branch-" + ReachMap.FILE_NAME));

        String zone = PACKAGE.formatted("main") + "Zone.java";
        List<String> before = Files.readAllLines(project.resolve(zone));
        edit(zone, "return dryBelowPercent - moisturePercent >= 15;",
                "int shortfall = dryBelowPercent - moisturePercent;\n        return shortfall >= 15;");
        afterEdit = ok(ToolRun.onCopyOfProject(project));
        afterEditCold = ok(ToolRun.onCopyOfProject(project, "--run-all"));
        List<String> after = Files.readAllLines(project.resolve(zone));
        Path review = folder.resolve("review.diff");
        Files.write(review, UnifiedDiffUtils.generateUnifiedDiff("a/" + zone, "b/" + zone, before, DiffUtils.diff(before, after), 3));
        scoped = ok(ToolRun.onCopyOfProject(project, "--diff-file", review.toString(), "--reach-map", mainBranchMap.toString()));
        scopedWholeSuite = ok(ToolRun.onCopyOfProject(project, "--diff-file", review.toString(), "--run-all"));

        Files.writeString(project.resolve(PACKAGE.formatted("test") + "NineInTheEveningTest.java"), """
                package dev.changeling.samples.greenhouse;

                import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

                import org.junit.jupiter.api.Test;

                class NineInTheEveningTest {

                    @Test
                    void nineInTheEveningIsNightAgain() {
                        assertEquals(WaterTariff.Band.NIGHT, WaterTariff.bandAt(21));
                    }
                }
                """);
        afterTest = ok(ToolRun.onCopyOfProject(project));
        afterTestCold = ok(ToolRun.onCopyOfProject(project, "--run-all"));

        edit("pom.xml", "<version>6.1.3</version>", "<version>6.0.3</version>");
        afterDependency = ok(ToolRun.onCopyOfProject(project));
    }

    @Test
    void aRunWithNothingChanged_recallsEveryVerdictTheTestsGave_andRunsNoMutant() {
        assertTrue(ran(cold) > 100, "the sample's mutants that ran tests: " + ran(cold));
        assertEquals(ran(cold), recalled(unchanged), unchanged::transcript);
        assertEquals(verdicts(cold.results()), verdicts(unchanged.results()));
        assertEquals(cold.results().compiledAlike(), unchanged.results().compiledAlike());
        assertEquals(0, recalled(cold));
    }

    @Test
    void aRecallFileThatCannotBeRead_isSetAsideWithANotice_andWrittenAgain() throws IOException {
        assertTrue(unreadable.err().contains(Recall.FILE_NAME + ": cannot read it"), unreadable::transcript);
        assertEquals(0, recalled(unreadable));
        assertEquals(verdicts(cold.results()), verdicts(unreadable.results()));
        assertTrue(recalled(afterEdit) > 0, "the file written again is read by the next run: " + afterEdit.transcript());
    }

    @Test
    void afterAnEditOfAMainMethod_theWarmRunGivesTheColdRunsVerdicts_runningOnlyWhatTheEditTouches() {
        assertEquals(verdicts(afterEditCold.results()), verdicts(afterEdit.results()));
        assertEquals(afterEditCold.results().compiledAlike(), afterEdit.results().compiledAlike());
        assertTrue(recalled(afterEdit) > 0 && recalled(afterEdit) < recalled(unchanged),
                "recalled after the edit: " + recalled(afterEdit) + " of " + recalled(unchanged));
        long ranInZone = afterEdit.results().mutants().stream()
                .filter(mutant -> mutant.file().endsWith("Zone.java") && !mutant.testsRun().isEmpty()).count();
        assertTrue(ranInZone > 0 && recalled(afterEdit) <= ran(afterEdit) - ranInZone,
                "every mutant of the edited file runs again: " + afterEdit.transcript());
        Set<String> reachingZone = new HashSet<>();
        afterEdit.results().mutants().stream().filter(mutant -> mutant.file().endsWith("Zone.java"))
                .forEach(mutant -> reachingZone.addAll(mutant.reachedBy()));
        long decidedWithoutZone = afterEdit.results().mutants().stream()
                .filter(mutant -> !mutant.file().endsWith("Zone.java") && !mutant.testsRun().isEmpty())
                .filter(mutant -> (mutant.verdict() == Verdict.SURVIVED ? mutant.testsRun() : List.of(String.valueOf(mutant.killedBy())))
                        .stream().noneMatch(reachingZone::contains))
                .count();
        assertTrue(recalled(afterEdit) > decidedWithoutZone, "verdicts whose tests reach Zone but whose runs did not enter the"
                + " edited method are recalled too: " + recalled(afterEdit) + " recalled, " + decidedWithoutZone
                + " decided by tests that reach no point of Zone");
    }

    @Test
    void afterANewTest_aSurvivorItKills_runsAgainAndIsKilled_asInAColdRun() {
        assertEquals(verdicts(afterTestCold.results()), verdicts(afterTest.results()));
        MutantResult nineOClock = afterTest.results().mutants().stream()
                .filter(mutant -> mutant.first().snippet().equals("hour<21") && mutant.first().replacement().equals("<="))
                .findFirst().orElseThrow();
        assertEquals(Verdict.SURVIVED, verdicts(afterEdit.results()).get(nineOClock.id()));
        assertEquals(Verdict.KILLED, nineOClock.verdict());
        assertTrue(nineOClock.killedBy().contains("NineInTheEveningTest"), nineOClock.killedBy());
        assertTrue(recalled(afterTest) > 0 && recalled(afterTest) < ran(afterTest), afterTest::transcript);
    }

    @Test
    void theBaselineRunsOnlyTheTestClassesTheReachMapCannotVouchFor() {
        assertTrue(unchanged.err().contains("reach map: 0 of 3 test classes run (new, changed, or reaching 0 changed files);"
                + " the reach of 30 tests comes from the map"), unchanged::transcript);
        assertTrue(afterTest.err().contains("reach map: 1 of 4 test classes run"), afterTest::transcript);
        assertTrue(afterEdit.err().contains("test classes run (new, changed, or reaching 1 changed file)"), afterEdit::transcript);
        assertFalse(afterEdit.err().contains("reach map: 0 of 3") || afterEdit.err().contains("reach map: 3 of 3"), afterEdit::transcript);
        assertEquals(cold.results().tests().size(), unchanged.results().tests().size());
        assertTrue(afterDependency.err().contains("the reach map was made with another build of the tool, Java, classpath, test"
                + " settings or operators: the whole suite runs"), afterDependency::transcript);
    }

    @Test
    void aRunScopedToTheEdit_withTheMapOfTheTreeBefore_runsOnlyTheTestClassesReachingTheEditedFile_andGivesTheWholeSuitesVerdicts() {
        assertTrue(scoped.err().contains("test classes run (new, changed, or reaching 1 changed file)"), scoped::transcript);
        assertFalse(scoped.err().contains("reach map: 3 of 3") || scoped.err().contains("reach map: 0 of 3"), scoped::transcript);
        assertFalse(scopedWholeSuite.err().contains("reach map:"), scopedWholeSuite::transcript);
        assertTrue(scoped.results().mutants().size() > 0);
        assertEquals(verdicts(scopedWholeSuite.results()), verdicts(scoped.results()));
    }

    @Test
    void afterADependencyChangedVersion_nothingIsRecalled() {
        assertEquals(0, recalled(afterDependency), afterDependency::transcript);
        assertEquals(verdicts(afterTestCold.results()), verdicts(afterDependency.results()));
    }

    private static ToolRun ok(ToolRun run) {
        assertEquals(ExitCode.OK, run.exitCode(), run::transcript);
        return run;
    }

    private void edit(String file, String from, String to) throws IOException {
        Path path = project.resolve(file);
        String text = Files.readString(path);
        assertTrue(text.contains(from), file + " no longer holds " + from);
        Files.writeString(path, text.replace(from, to));
    }

    /** The mutants the tests decided, recalled or run: those with tests run against them. */
    private static long ran(ToolRun run) {
        return run.results().mutants().stream().filter(mutant -> !mutant.testsRun().isEmpty()).count();
    }

    private static long recalled(ToolRun run) {
        Matcher matcher = RECALLED.matcher(run.err());
        return matcher.find() ? Long.parseLong(matcher.group(1)) : 0;
    }

    private static Map<String, Verdict> verdicts(RunResults results) {
        Map<String, Verdict> verdicts = new TreeMap<>();
        results.mutants().forEach(mutant -> verdicts.put(mutant.id(), mutant.verdict()));
        return verdicts;
    }
}
