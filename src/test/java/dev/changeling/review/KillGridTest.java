package dev.changeling.review;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.results.MutantResult;
import dev.changeling.results.ResultsForTests;
import dev.changeling.results.RunResults;
import dev.changeling.results.Verdict;
import java.util.List;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

class KillGridTest {

    /** A mutant of {@code operator} that {@code killers} kill, the first of them named as the one that failed first. */
    static MutantResult killedBy(String id, String operator, List<String> killers) {
        MutantResult made = ResultsForTests.result(id, "src/main/java/shop/Till.java", operator, 1,
                killers == null || !killers.isEmpty() ? Verdict.KILLED : Verdict.SURVIVED);
        String first = killers == null || killers.isEmpty() ? null : killers.get(0);
        return new MutantResult(made.id(), made.file(), 1, made.points(), made.verdict(), first, null, List.of(),
                List.of(), 1.0, made.diff(), killers, null);
    }

    static MutantResult firstFailureOnly(String id, String operator, String test) {
        MutantResult made = ResultsForTests.result(id, "src/main/java/shop/Till.java", operator, 1, Verdict.KILLED);
        return new MutantResult(made.id(), made.file(), 1, made.points(), Verdict.KILLED, test, null, List.of(test),
                List.of(test), 1.0, made.diff());
    }

    private static RunResults run(MutantResult... mutants) {
        return ResultsForTests.run(List.of(mutants), false, mutants.length);
    }

    @Nested
    class FullKillMatrix {

        private final RunResults results = run(
                killedBy("a1", "arithmetic-swap", List.of("t1", "t2")),
                killedBy("a2", "arithmetic-swap", List.of("t1")),
                killedBy("r1", "relational-subset", List.of("t2", "t3")),
                killedBy("r2", "relational-subset", List.of()));

        @Test
        void countsEveryKillerOfEveryMutant_perOperator() {
            KillGrid grid = KillGrid.of(results, 10);

            assertEquals(List.of("arithmetic-swap", "relational-subset"), grid.operators());
            assertEquals(List.of(new KillGrid.Row("t1", List.of(2, 0)), new KillGrid.Row("t2", List.of(1, 1)),
                    new KillGrid.Row("t3", List.of(0, 1))), grid.rows());
            assertFalse(grid.lowerBound());
            assertEquals(2, grid.largest());
        }

        @Test
        void testsBeyondTheTop_areCountedWithTheirKills() {
            KillGrid grid = KillGrid.of(results, 1);

            assertEquals(List.of(new KillGrid.Row("t1", List.of(2, 0))), grid.rows());
            assertEquals(2, grid.otherTests());
            assertEquals(3, grid.otherKills());
        }
    }

    @Nested
    class FirstFailureOnly {

        @Test
        void countsTheTestThatFailedFirst_andSaysItIsALowerBound() {
            KillGrid grid = KillGrid.of(run(
                    firstFailureOnly("a1", "arithmetic-swap", "t1"),
                    firstFailureOnly("a2", "arithmetic-swap", "t1"),
                    firstFailureOnly("r1", "relational-subset", "t2")), 30);

            assertEquals(List.of(new KillGrid.Row("t1", List.of(2, 0)), new KillGrid.Row("t2", List.of(0, 1))), grid.rows());
            assertTrue(grid.lowerBound());
        }

        @Test
        void noKills_giveNoRows() {
            KillGrid grid = KillGrid.of(run(killedBy("r2", "relational-subset", List.of())), 30);

            assertEquals(List.of(), grid.rows());
            assertEquals(0, grid.largest());
        }
    }
}
