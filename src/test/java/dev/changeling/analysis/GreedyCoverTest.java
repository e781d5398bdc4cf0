package dev.changeling.analysis;

import static dev.changeling.analysis.Made.mutant;
import static dev.changeling.analysis.Made.run;
import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.changeling.analysis.GreedyCover.Pick;
import dev.changeling.results.MutantResult;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.api.Test;

class GreedyCoverTest {

    private static MutantResult killedBy(String id, String... killers) {
        return mutant(id, "A.java", 1, List.of(killers), List.of(killers));
    }

    private static List<String> chosen(KillMatrix matrix, GreedyCover cover) {
        return cover.picks().stream().map(pick -> matrix.tests().get(pick.test())).toList();
    }

    @Test
    void tiesGoToTheSmallerTestId_notTheFirstRow() {
        KillMatrix matrix = KillMatrix.of(run(List.of("b", "c", "a"), List.of(
                killedBy("m1", "a", "b"), killedBy("m2", "b", "a"), killedBy("m3", "c"))), Set.of());

        GreedyCover cover = GreedyCover.of(matrix);

        assertEquals(List.of("a", "c"), chosen(matrix, cover));
        assertEquals(List.of(new Pick(2, 2), new Pick(1, 1)), cover.picks());
        assertEquals(3, cover.killed());
        assertEquals(2.0 / 3, cover.share(), 1e-12);
    }

    /** The textbook case where greedy set cover is not minimal (common practice, no source): x and y suffice. */
    @Test
    void greedyIsNotAlwaysMinimal() {
        KillMatrix matrix = KillMatrix.of(run(List.of("x", "y", "z"), List.of(
                killedBy("m1", "x", "z"), killedBy("m2", "x", "z"), killedBy("m3", "x"),
                killedBy("m4", "y", "z"), killedBy("m5", "y", "z"), killedBy("m6", "y"))), Set.of());

        assertEquals(List.of("z", "x", "y"), chosen(matrix, GreedyCover.of(matrix)));
    }

    @Test
    void testsThatKillNothing_andSurvivors_areLeftOut() {
        KillMatrix matrix = KillMatrix.of(run(List.of("t1", "t2", "idle"), List.of(
                killedBy("m1", "t1"), killedBy("m2", "t1", "t2"), mutant("s", "A.java", 3, List.of("idle"), List.of()))),
                Set.of());

        GreedyCover cover = GreedyCover.of(matrix);

        assertEquals(List.of("t1"), chosen(matrix, cover));
        assertEquals(3, cover.suite());
        assertEquals(2, cover.killed());
    }

    @Test
    void nothingKilled_choosesNothing() {
        GreedyCover cover = GreedyCover.of(KillMatrix.of(run(List.of(), List.of()), Set.of()));

        assertEquals(List.of(), cover.picks());
        assertEquals(0.0, cover.share());
    }

    /** The lazy evaluation picks exactly what recomputing every test's gain at every step picks. */
    @Test
    void choosesAsThePlainGreedyRuleDoes_onRandomMatrices() {
        Random random = new Random(20_240_611L);
        for (int round = 0; round < 50; round++) {
            int testCount = 1 + random.nextInt(30);
            List<String> tests = new ArrayList<>();
            for (int test = 0; test < testCount; test++) {
                tests.add(String.format("t%02d", random.nextInt(100)) + "-" + test);
            }
            List<MutantResult> mutants = new ArrayList<>();
            for (int m = 0; m < 40; m++) {
                List<String> killers = tests.stream().filter(test -> random.nextInt(6) == 0).toList();
                mutants.add(mutant("m" + m, "A.java", m, killers, killers));
            }
            KillMatrix matrix = KillMatrix.of(run(tests, mutants), Set.of());

            assertEquals(plainGreedy(matrix), GreedyCover.of(matrix).picks(), "round " + round);
        }
    }

    private static List<Pick> plainGreedy(KillMatrix matrix) {
        BitSet left = matrix.killed();
        List<Pick> picks = new ArrayList<>();
        while (!left.isEmpty()) {
            int best = -1;
            int bestGain = 0;
            for (int test = 0; test < matrix.tests().size(); test++) {
                BitSet gained = (BitSet) matrix.killsOf(test).clone();
                gained.and(left);
                int gain = gained.cardinality();
                if (gain > bestGain || gain == bestGain && gain > 0
                        && matrix.tests().get(test).compareTo(matrix.tests().get(best)) < 0) {
                    best = test;
                    bestGain = gain;
                }
            }
            picks.add(new Pick(best, bestGain));
            left.andNot(matrix.killsOf(best));
        }
        return picks;
    }
}
