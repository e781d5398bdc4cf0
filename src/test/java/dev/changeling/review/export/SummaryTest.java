package dev.changeling.review.export;

import dev.changeling.results.RunResults;
import static dev.changeling.results.ResultsForTests.result;
import static dev.changeling.results.ResultsForTests.run;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.mutant.LineBudget;
import dev.changeling.results.MutantResult;
import dev.changeling.results.PointRecord;
import dev.changeling.review.RunFixtures;
import dev.changeling.results.Verdict;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

class SummaryTest {

    private static List<MutantResult> detectedOf(int detected, int total) {
        List<MutantResult> mutants = new ArrayList<>();
        for (int i = 0; i < total; i++) {
            mutants.add(result("m" + i, "A.java", "op", 1, i < detected ? Verdict.KILLED : Verdict.SURVIVED));
        }
        return mutants;
    }

    private static String line(List<MutantResult> mutants, boolean sampled, Set<String> equivalent) {
        return Summary.line(Standings.of(run(mutants, sampled, 1000), equivalent, m -> false));
    }

    @Nested
    class Rounding {

        @Test
        void scoreRoundsDown_soOnlyAPerfectScoreShowsOne() {
            assertTrue(line(detectedOf(999, 1000), false, Set.of()).startsWith("mutation score 0.99 (999 of 1000 detected)"));
            assertTrue(line(detectedOf(2, 3), false, Set.of()).startsWith("mutation score 0.66 "));
            assertTrue(line(detectedOf(4, 4), false, Set.of()).startsWith("mutation score 1.00 "));
        }

        @Test
        void intervalRoundsOutward() {
            // 15 of 20: Wilson 95% interval 0.5313 to 0.8881 (recomputed with the formula).
            assertTrue(line(detectedOf(15, 20), true, Set.of()).contains("95% interval 0.53–0.89"));
        }
    }

    @Nested
    class Content {

        @Test
        void fullRun_hasNoInterval() {
            assertFalse(line(detectedOf(15, 20), false, Set.of()).contains("interval"));
        }

        @Test
        void countsEveryVerdictPresent_andTheEquivalents() {
            List<MutantResult> mutants = new ArrayList<>(detectedOf(2, 4));
            mutants.add(result("x", "A.java", "op", 1, Verdict.TIMED_OUT));
            mutants.add(result("y", "A.java", "op", 1, Verdict.STILLBORN));

            String line = line(mutants, false, Set.of("m3"));

            assertEquals("mutation score 0.75 (3 of 4 detected) · 6 mutants · killed 2 · survived 2 · timed out 1"
                    + " · stillborn 1 · equivalent 1 · 1 survivor to look at", line);
        }

        @Test
        void noCountedMutant_saysSo() {
            assertEquals("mutation score n/a (no mutant counts) · 0 mutants · killed 0 · survived 0 · 0 survivors to look at",
                    line(List.of(), false, Set.of()));
        }
    }

    @Test
    void filesThatCouldNotBeRead_areCountedOutsideTheScore() {
        RunResults read = run(detectedOf(3, 4), false, 0);
        RunResults unread = new RunResults(read.format(), true, read.settings(), read.tests(), read.timings(),
                read.mutants(), List.of("A.java:3: Parse error", "B.java:9: Parse error"), read.sourceHashes());

        String line = Summary.line(Standings.of(unread, m -> false));

        assertTrue(line.startsWith("mutation score 0.75 (3 of 4 detected)"), line);
        assertTrue(line.contains(" · 2 files could not be read — not in the score"), line);
        assertFalse(Summary.line(Standings.of(read, m -> false)).contains("could not be read"));
    }

    @Test
    void pointsLeftOutByTheBudget_areCountedAsNotMade_inWordsOfTheirOwn() {
        assertEquals("9 not made (2 in logging calls, 6 over the per-line budget, 1 by rule at line 4: dashboards only)",
                Summary.notMade(new TreeMap<>(Map.of("logging call", 2, LineBudget.REASON, 6, "rule at line 4: dashboards only", 1))));
    }

    @Nested
    class Coverage {

        /** On line 10 a killed mutant and a survivor (reached), on line 11 one unreached: 1 of 2 lines run. */
        private List<MutantResult> mutants() {
            MutantResult unreached = result("u", "A.java", "op", 1, Verdict.UNREACHED);
            return List.of(result("k", "A.java", "op", 1, Verdict.KILLED), result("s", "A.java", "op", 1, Verdict.SURVIVED),
                    new MutantResult(unreached.id(), unreached.file(), 1, List.of(new PointRecord("u",
                            "op", "shop.Till", "total(int)", 11, 1, 11, 1, "<", "<=", "a < b", "replaced < with <=")),
                            Verdict.UNREACHED, null, null, List.of(), List.of(), 0.0, unreached.diff()));
        }

        @Test
        void theShareOfMutatedLinesRun_andTheMutantsOnThemNoTestDetects() {
            assertEquals("line coverage 0.50 (1 of 2 mutated lines run by a test) · 1 mutant on lines the tests run goes unnoticed",
                    Summary.coverage(Standings.of(run(mutants(), false, 3), m -> false)));
        }

        @Test
        void aRunScopedToAChange_saysSo() {
            RunResults whole = run(mutants(), false, 3);
            RunResults scoped = new RunResults(whole.format(), true, RunFixtures.settings(false,
                    "changes since main"), whole.tests(), whole.timings(), whole.mutants(), whole.problems(), whole.sourceHashes());

            assertTrue(Summary.coverage(Standings.of(scoped, m -> false)).startsWith("line coverage of the change 0.50 "));
        }

        @Test
        void equivalentsAreLeftOut_andNothingCountedReadsNotApplicable() {
            assertTrue(Summary.coverage(Standings.of(run(mutants(), false, 3), Set.of("s"), m -> false))
                    .endsWith(" · 0 mutants on lines the tests run go unnoticed"));
            assertEquals("line coverage n/a (no mutated line counts)",
                    Summary.coverage(Standings.of(run(List.of(), false, 0), m -> false)));
        }
    }
}
