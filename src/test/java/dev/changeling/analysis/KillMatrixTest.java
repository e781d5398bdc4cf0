package dev.changeling.analysis;

import static dev.changeling.analysis.Made.firstFailureOnly;
import static dev.changeling.analysis.Made.mutant;
import static dev.changeling.analysis.Made.run;
import static dev.changeling.analysis.Made.withVerdict;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.results.MutantResult;
import dev.changeling.results.Verdict;
import java.util.BitSet;
import java.util.List;
import java.util.Set;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;

class KillMatrixTest {

    private static BitSet bits(int... set) {
        BitSet bits = new BitSet();
        for (int bit : set) {
            bits.set(bit);
        }
        return bits;
    }

    @Test
    void rowsAreTheSuiteThenOtherTestsNamed_columnsTheCountedMutants() {
        KillMatrix matrix = KillMatrix.of(run(List.of("t1", "t2"), List.of(
                mutant("m1", "A.java", 1, List.of("t1", "t2"), List.of("t2", "t1")),
                withVerdict(mutant("gone", "A.java", 2, List.of(), List.of()), Verdict.STILLBORN),
                mutant("m2", "A.java", 3, List.of("t1", "t9"), List.of()),
                mutant("listed", "A.java", 4, List.of("t1"), List.of()))), Set.of("listed"));

        assertEquals(List.of("t1", "t2", "t9"), matrix.tests());
        assertEquals("name of t1", matrix.name(0));
        assertEquals("t9", matrix.name(2), "a test outside the baseline is named by its id");
        assertEquals(List.of("m1", "m2"), matrix.mutants().stream().map(m -> m.id()).toList());
        assertEquals(bits(0, 1), matrix.killersOf(0));
        assertEquals(bits(), matrix.killersOf(1));
        assertEquals(bits(0, 2), matrix.reachOf(1));
        assertEquals(bits(0), matrix.killsOf(1));
        assertEquals(bits(0), matrix.killed());
        assertTrue(matrix.complete());
    }

    @Test
    void killersNull_fallsBackOnTheFirstFailingTest_andTheMatrixIsALowerBound() {
        KillMatrix matrix = KillMatrix.of(run(List.of("t1", "t2"), List.of(
                firstFailureOnly("m1", List.of("t1", "t2"), "t2"),
                mutant("m2", "A.java", 3, List.of("t1", "t2"), List.of("t1", "t2")))), Set.of());

        assertFalse(matrix.complete());
        assertEquals(bits(1), matrix.killersOf(0));
        assertEquals(bits(0, 1), matrix.killersOf(1));
    }

    @Test
    void aTimedOutMutant_isKilledByTheTestRunningAtTheDeadline() {
        KillMatrix matrix = KillMatrix.of(run(List.of("t1"), List.of(
                withVerdict(mutant("m1", "A.java", 1, List.of("t1"), List.of("t1")), Verdict.TIMED_OUT))), Set.of());

        assertEquals(bits(0), matrix.killersOf(0));
    }

    /** 10,000 tests × 1,000 mutants: the size the analyses are built for (speed is not asserted here). */
    @Test
    void aLargeMatrix_isBuilt() {
        List<String> tests = IntStream.range(0, 10_000).mapToObj(i -> "t" + i).toList();
        List<MutantResult> mutants = IntStream.range(0, 1_000)
                .mapToObj(i -> mutant("m" + i, "A.java", i, tests.subList(i, i + 50), tests.subList(i, i + 5))).toList();

        KillMatrix matrix = KillMatrix.of(run(tests, mutants), Set.of());

        assertEquals(1_000, matrix.killed().cardinality());
        assertEquals(5, matrix.killsOf(500).cardinality());
        assertEquals(1_000, GreedyCover.of(matrix).picks().stream().mapToInt(GreedyCover.Pick::added).sum());
        // Mutant i is killed by tests i to i + 4: no set is inside another, so every mutant subsumes.
        assertEquals(1_000, Subsumption.of(matrix).subsumingMutants());
    }
}
