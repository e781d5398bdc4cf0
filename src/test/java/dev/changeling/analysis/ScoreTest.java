package dev.changeling.analysis;

import static dev.changeling.results.ResultsForTests.result;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.results.MutantResult;
import dev.changeling.results.Verdict;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

class ScoreTest {

    private static List<MutantResult> mixed() {
        List<MutantResult> mutants = new ArrayList<>();
        int n = 0;
        for (int i = 0; i < 6; i++) {
            mutants.add(result("k" + n++, "src/Till.java", "relational-subset", 1, Verdict.KILLED));
        }
        mutants.add(result("t" + n++, "src/Till.java", "relational-subset", 1, Verdict.TIMED_OUT));
        mutants.add(result("c" + n++, "src/Fees.java", "relational-subset", 1, Verdict.CRASHED));
        mutants.add(result("s" + n++, "src/Fees.java", "relational-subset", 1, Verdict.SURVIVED));
        mutants.add(result("u" + n++, "src/Fees.java", "relational-subset", 1, Verdict.UNREACHED));
        mutants.add(result("b" + n++, "src/Fees.java", "relational-subset", 1, Verdict.STILLBORN));
        mutants.add(result("b" + n++, "src/Fees.java", "relational-all", 1, Verdict.STILLBORN));
        mutants.add(result("x" + n++, "src/Fees.java", "relational-all", 1, Verdict.SKIPPED));
        mutants.add(result("eq", "src/Fees.java", "relational-all", 1, Verdict.SURVIVED));
        mutants.add(result("k2", "src/Fees.java", "relational-all", 2, Verdict.KILLED));
        mutants.add(result("s2", "src/Fees.java", "relational-all", 2, Verdict.SURVIVED));
        return mutants;
    }

    @Nested
    class Overall {

        // DeMillo, Lipton & Sayward (1978), "Hints on test data selection", IEEE Computer 11(4) (from
        // memory): score = killed / (generated - equivalent); stillborn mutants are not generated ones,
        // and here timed-out and crashed mutants count as killed.
        @Test
        void detectedOverAllButStillbornSkippedAndEquivalent() {
            Tally tally = Score.of(mixed(), Set.of("eq")).overall();

            assertEquals(16, tally.all());
            assertEquals(9, tally.detected());
            assertEquals(1, tally.equivalent());
            assertEquals(16 - 2 - 1 - 1, tally.denominator());
            assertEquals(3, tally.undetected());
            assertEquals(9.0 / 12, tally.score().getAsDouble(), 1e-15);
        }

        @Test
        void countsEveryVerdict() {
            Tally tally = Score.of(mixed(), Set.of()).overall();

            assertEquals(7, tally.count(Verdict.KILLED));
            assertEquals(1, tally.count(Verdict.TIMED_OUT));
            assertEquals(1, tally.count(Verdict.CRASHED));
            assertEquals(3, tally.count(Verdict.SURVIVED));
            assertEquals(1, tally.count(Verdict.UNREACHED));
            assertEquals(2, tally.count(Verdict.STILLBORN));
            assertEquals(1, tally.count(Verdict.SKIPPED));
        }

        @Test
        void intervalIsTheWilsonIntervalOfDetectedInDenominator() {
            Tally tally = Score.of(mixed(), Set.of("eq")).overall();

            assertEquals(Interval.wilson95(9, 12), tally.interval95().orElseThrow());
        }
    }

    @Nested
    class Equivalents {

        @Test
        void survivorOnTheList_leavesTheDenominator() {
            List<MutantResult> mutants = List.of(
                    result("a", "F.java", "op", 1, Verdict.KILLED),
                    result("b", "F.java", "op", 1, Verdict.SURVIVED));

            assertEquals(0.5, Score.of(mutants, Set.of()).overall().score().getAsDouble());
            assertEquals(1.0, Score.of(mutants, Set.of("b")).overall().score().getAsDouble());
        }

        @Test
        void unreachedOnTheList_leavesTheDenominator() {
            List<MutantResult> mutants = List.of(
                    result("a", "F.java", "op", 1, Verdict.KILLED),
                    result("u", "F.java", "op", 1, Verdict.UNREACHED));

            assertEquals(1, Score.of(mutants, Set.of("u")).overall().equivalent());
        }

        @Test
        void detectedMutantOnTheList_staysDetected() {
            List<MutantResult> mutants = List.of(
                    result("a", "F.java", "op", 1, Verdict.KILLED),
                    result("b", "F.java", "op", 1, Verdict.SURVIVED));

            Tally tally = Score.of(mutants, Set.of("a")).overall();

            assertEquals(0, tally.equivalent());
            assertEquals(0.5, tally.score().getAsDouble());
        }

        @Test
        void stillbornMutantOnTheList_isNotLeftOutTwice() {
            List<MutantResult> mutants = List.of(
                    result("a", "F.java", "op", 1, Verdict.KILLED),
                    result("b", "F.java", "op", 1, Verdict.SURVIVED),
                    result("dead", "F.java", "op", 1, Verdict.STILLBORN));

            Tally tally = Score.of(mutants, Set.of("dead")).overall();

            assertEquals(0, tally.equivalent());
            assertEquals(2, tally.denominator());
        }
    }

    @Nested
    class Groups {

        @Test
        void perFile() {
            Score score = Score.of(mixed(), Set.of("eq"));

            assertEquals(List.of("src/Fees.java", "src/Till.java"), List.copyOf(score.byFile().keySet()));
            assertEquals(7, score.byFile().get("src/Till.java").detected());
            assertEquals(1.0, score.byFile().get("src/Till.java").score().getAsDouble());
            Tally fees = score.byFile().get("src/Fees.java");
            assertEquals(2, fees.detected());
            assertEquals(5, fees.denominator());
        }

        @Test
        void perOperatorOfTheFirstPoint_withKOrderMutantsApart() {
            Score score = Score.of(mixed(), Set.of("eq"));

            assertEquals(List.of(
                            new Score.OperatorOrder("relational-all", 1),
                            new Score.OperatorOrder("relational-all", 2),
                            new Score.OperatorOrder("relational-subset", 1)),
                    List.copyOf(score.byOperator().keySet()));
            Tally secondOrder = score.byOperator().get(new Score.OperatorOrder("relational-all", 2));
            assertEquals(2, secondOrder.all());
            assertEquals(0.5, secondOrder.score().getAsDouble());
            Tally firstOrderAll = score.byOperator().get(new Score.OperatorOrder("relational-all", 1));
            assertFalse(firstOrderAll.score().isPresent(), "stillborn, skipped and equivalent only");
        }

        @Test
        void perOrder() {
            Score score = Score.of(mixed(), Set.of());

            assertEquals(14, score.byOrder().get(1).all());
            assertEquals(2, score.byOrder().get(2).all());
        }

        @Test
        void groupsAddUpToTheOverallFigures() {
            Score score = Score.of(mixed(), Set.of("eq"));

            for (var groups : List.of(score.byFile(), score.byOperator(), score.byOrder())) {
                assertEquals(score.overall().all(), groups.values().stream().mapToInt(Tally::all).sum());
                assertEquals(score.overall().detected(), groups.values().stream().mapToInt(Tally::detected).sum());
                assertEquals(score.overall().denominator(), groups.values().stream().mapToInt(Tally::denominator).sum());
            }
        }
    }

    @Nested
    class EmptyDenominator {

        @Test
        void noMutants_hasNoScoreAndNoInterval() {
            Tally tally = Score.of(List.of(), Set.of()).overall();

            assertEquals(0, tally.all());
            assertFalse(tally.score().isPresent());
            assertFalse(tally.interval95().isPresent());
            assertTrue(Score.of(List.of(), Set.of()).byFile().isEmpty());
        }

        @Test
        void onlyStillbornSkippedAndEquivalent_hasNoScore() {
            List<MutantResult> mutants = List.of(
                    result("a", "F.java", "op", 1, Verdict.STILLBORN),
                    result("b", "F.java", "op", 1, Verdict.SKIPPED),
                    result("c", "F.java", "op", 1, Verdict.SURVIVED));

            Tally tally = Score.of(mutants, Set.of("c")).overall();

            assertEquals(3, tally.all());
            assertEquals(0, tally.denominator());
            assertFalse(tally.score().isPresent());
            assertFalse(tally.interval95().isPresent());
        }
    }
}
