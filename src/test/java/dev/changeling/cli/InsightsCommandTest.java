package dev.changeling.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.ExitCode;
import dev.changeling.project.ProjectLayout;
import dev.changeling.results.MutantResult;
import dev.changeling.results.PointRecord;
import dev.changeling.results.ResultsFile;
import dev.changeling.results.RunResults;
import dev.changeling.results.RunSettings;
import dev.changeling.results.TestRecord;
import dev.changeling.results.Verdict;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A garden sprinkler's run: five tests (one reaches nothing, one reaches but kills nothing), three first-order mutants
 * killed, a survivor, an unreached mutant in the valve, and two second-order mutants of killed parts, one killed and one
 * alive.
 */
class InsightsCommandTest {

    private static final String SPRINKLER = "src/main/java/garden/Sprinkler.java";
    private static final String VALVE = "src/main/java/garden/Valve.java";
    private static final List<String> TESTS = List.of("wets", "rain", "beds", "opens", "logs");

    @TempDir
    Path project;

    private static PointRecord point(String fingerprint, String type, String member, int line) {
        return new PointRecord(fingerprint, "relational-subset", type, member, line, 13, line, 13, "<", "<=", "dry < 3",
                "replaced < with <=");
    }

    private static MutantResult mutant(String id, String file, String member, int line, List<String> reach,
                                       List<String> killers, boolean fullMatrix) {
        Verdict verdict = !killers.isEmpty() ? Verdict.KILLED : reach.isEmpty() ? Verdict.UNREACHED : Verdict.SURVIVED;
        return new MutantResult(id, file, 1, List.of(point(id, "garden.Sprinkler", member, line)), verdict,
                killers.isEmpty() ? null : killers.get(0), null, reach, reach, 1.0, "", fullMatrix ? killers : null);
    }

    private static MutantResult pair(String id, String first, String second, List<String> killers, boolean fullMatrix) {
        String diff = "--- a/" + SPRINKLER + "\n+++ b/" + SPRINKLER + "\n@@ -10,3 +10,3 @@\n-        if (dry < 3) {\n"
                + "+        if (dry <= 3) {\n";
        return new MutantResult(id, SPRINKLER, 2, List.of(point(first, "garden.Sprinkler", "water(int)", 10),
                point(second, "garden.Sprinkler", "water(int)", 20)), killers.isEmpty() ? Verdict.SURVIVED : Verdict.KILLED,
                killers.isEmpty() ? null : killers.get(0), null, List.of("wets", "rain"), List.of("wets", "rain"), 1.0, diff,
                fullMatrix ? killers : null);
    }

    private void write(boolean fullMatrix, String changeScope) throws IOException {
        Files.writeString(project.resolve("pom.xml"), "<project/>\n");
        List<MutantResult> mutants = new ArrayList<>(List.of(
                mutant("f1aaaaaa", SPRINKLER, "water(int)", 10, List.of("wets", "rain", "logs"), List.of("wets", "rain"), fullMatrix),
                mutant("f2bbbbbb", SPRINKLER, "water(int)", 12, List.of("wets", "logs"), List.of("wets"), fullMatrix),
                mutant("f3cccccc", SPRINKLER, "beds()", 20, List.of("beds"), List.of("beds"), fullMatrix),
                mutant("s1dddddd", SPRINKLER, "water(int)", 14, List.of("wets", "rain"), List.of(), fullMatrix),
                mutant("u1eeeeee", VALVE, "open()", 5, List.of(), List.of(), fullMatrix),
                pair("h1ffffff", "f1aaaaaa", "f2bbbbbb", List.of("wets"), fullMatrix),
                pair("h2999999", "f1aaaaaa", "f3cccccc", List.of(), fullMatrix)));
        RunSettings settings = new RunSettings(project.toString(), List.of("relational-subset"), List.of(1, 2), "method", 1L,
                false, mutants.size(), changeScope, 1, 2.0, 300L, List.of(), List.of(), List.of(), null, null, null, 500, false, 0, false, null);
        List<TestRecord> tests = TESTS.stream().map(id -> new TestRecord(id, "SprinklerTest › " + id + "()", 2.0)).toList();
        ResultsFile.write(ProjectLayout.of(project).resultsFile(),
                new RunResults(RunResults.FORMAT, true, settings, tests, Map.of(), mutants, List.of(), Map.of()));
    }

    private CommandOutcome insights(String... more) {
        List<String> line = new ArrayList<>(List.of("insights", project.toString(), "--plain"));
        line.addAll(List.of(more));
        return CommandOutcome.of(line.toArray(String[]::new));
    }

    @Nested
    class FullMatrix {

        @Test
        void everySectionHasItsFigures() throws IOException {
            write(true, null);

            CommandOutcome ran = insights();

            assertEquals(ExitCode.OK, ran.code(), ran.err());
            String out = ran.out();
            assertTrue(out.startsWith("insights of 7 mutants and 5 tests\nkill matrix: full"), out);
            // Lines 10, 12, 14, 20 of the sprinkler run; line 5 of the valve does not; s1 and h2 go unnoticed.
            assertTrue(out.matches("(?s).*\n  src/main/java/garden/Sprinkler\\.java +score 0\\.66 +lines run 1\\.00 \\(4 of 4\\)"
                    + "  unnoticed on them 2\n.*"), out);
            assertTrue(out.matches("(?s).*\n  all files +score 0\\.57 +lines run 0\\.80 \\(4 of 5\\)  unnoticed on them 2\n.*"), out);
            assertTrue(out.contains("\n     3 killed, 2 alone  SprinklerTest › wets()\n"), out);
            assertTrue(out.contains("two may share a kill): 1\n      SprinklerTest › rain()\n"), out);
            assertTrue(out.contains("kill nothing: 2 (1 of them reach no mutant)\n      SprinklerTest › logs()\n"
                    + "      SprinklerTest › opens()  (reaches no mutant)\n"), out);
            assertTrue(out.contains("  2 of 5 tests (0.40 of the suite) kill all 4 mutants the suite kills\n"
                    + "     +3  SprinklerTest › wets()\n     +1  SprinklerTest › beds()\n"), out);
            assertTrue(out.contains("  4 killed mutants in 3 groups of the same killers; 2 of those subsume the rest\n"
                    + "  subsuming mutants 5 (2 killed groups + 3 undetected) · score over them 0.40 (mutation score 0.57)\n"), out);
            assertTrue(out.contains("none of its mutants): 1 method\n    garden.Sprinkler.water(int)  " + SPRINKLER
                    + "  1 of 3 reaching tests, 5 mutants: SprinklerTest › logs()\n"), out);
            assertTrue(out.contains("  coupling ratio 0.50 (1 of 2 detected; 0 left out: a part missing or undetected)\n"), out);
            assertTrue(out.contains("Offutt 1992"), out);
            assertTrue(out.contains("detected: 1\n    h2999999  " + SPRINKLER + ":10  order 2\n      --- a/" + SPRINKLER), out);
        }

        @Test
        void topShortensEachList_andCountsTheRest() throws IOException {
            write(true, null);

            CommandOutcome ran = insights("--top", "1");

            assertEquals(ExitCode.OK, ran.code(), ran.err());
            assertTrue(ran.out().contains("     +3  SprinklerTest › wets()\n    … and 1 more (--top 0 lists all)\n"), ran.out());
        }

        @Test
        void aRunScopedToAChange_namesTheChange() throws IOException {
            write(true, "changes since main");

            String out = insights().out();

            assertTrue(out.matches("(?s).*\n  the change \\(changes since main\\) +score 0\\.57 .*"), out);
        }
    }

    @Test
    void withoutKillers_theFiguresAreSaidToBeALowerBound() throws IOException {
        write(false, null);

        CommandOutcome ran = insights();

        assertEquals(ExitCode.OK, ran.code(), ran.err());
        assertTrue(ran.out().contains("kill matrix: first failures only"), ran.out());
        assertTrue(ran.out().contains("lower bound"), ran.out());
        // Only each mutant's first failing test kills: rain() no longer kills f1, so it kills nothing.
        assertTrue(ran.out().contains("kill nothing: 3 (1 of them reach no mutant)"), ran.out());
        assertTrue(ran.out().contains("subsumption (from first failures only: approximate)"), ran.out());
    }

    @Test
    void noResults_isAMistakeToFix() throws IOException {
        Files.writeString(project.resolve("pom.xml"), "<project/>\n");

        CommandOutcome ran = insights();

        assertEquals(ExitCode.USER_ERROR, ran.code());
        assertTrue(ran.err().contains("results.json"), ran.err());
    }

    @Test
    void aNegativeTop_isAUsageError() throws IOException {
        write(true, null);

        assertEquals(ExitCode.USAGE, insights("--top", "-1").code());
    }
}
