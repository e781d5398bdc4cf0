package dev.changeling.analysis;

import static dev.changeling.analysis.Made.firstFailureOnly;
import static dev.changeling.analysis.Made.mutant;
import static dev.changeling.analysis.Made.run;
import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.changeling.results.MutantResult;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;

/**
 * Subsumption as Ammann, Delamaro & Offutt (2014, ICST) and Kurtz et al. (2014) define it over a test set (from
 * memory): A subsumes B when A is killed and every test killing A kills B too.
 */
class SubsumptionTest {

    private static MutantResult killedBy(String id, String... killers) {
        return mutant(id, "A.java", 1, List.of(killers), List.of(killers));
    }

    @Test
    void theSmallestKillerSetsSubsume_andIdenticalSetsAreOneGroup() {
        // Columns: m1 {t1}, m2 and m3 {t1, t2}, m4 {t3}, m5 {t2, t3}, s undetected.
        KillMatrix matrix = KillMatrix.of(run(List.of("t1", "t2", "t3"), List.of(
                killedBy("m1", "t1"), killedBy("m2", "t1", "t2"), killedBy("m3", "t2", "t1"), killedBy("m4", "t3"),
                killedBy("m5", "t2", "t3"), mutant("s", "A.java", 2, List.of("t1"), List.of()))), Set.of());

        Subsumption subsumption = Subsumption.of(matrix);

        assertEquals(5, subsumption.killed());
        assertEquals(4, subsumption.groups());
        assertEquals(List.of(List.of(0), List.of(3)), subsumption.subsuming());
        assertEquals(1, subsumption.undetected());
        assertEquals(3, subsumption.subsumingMutants());
        assertEquals(2.0 / 3, subsumption.score().getAsDouble(), 1e-12);
    }

    @Test
    void mutantsWithIdenticalKillers_countOnce() {
        KillMatrix matrix = KillMatrix.of(run(List.of("t1", "t2"), List.of(
                killedBy("m1", "t1", "t2"), killedBy("m2", "t2", "t1"), killedBy("m3", "t1", "t2"))), Set.of());

        Subsumption subsumption = Subsumption.of(matrix);

        assertEquals(List.of(List.of(0, 1, 2)), subsumption.subsuming());
        assertEquals(1, subsumption.subsumingMutants());
        assertEquals(1.0, subsumption.score().getAsDouble());
    }

    @Test
    void overlappingKillerSets_neitherInsideTheOther_bothSubsume() {
        KillMatrix matrix = KillMatrix.of(run(List.of("t1", "t2", "t3"), List.of(
                killedBy("m1", "t1", "t2"), killedBy("m2", "t2", "t3"))), Set.of());

        assertEquals(2, Subsumption.of(matrix).subsumingMutants());
    }

    @Test
    void withoutKillers_theFirstFailingTestAloneDecides() {
        KillMatrix matrix = KillMatrix.of(run(List.of("t1", "t2"), List.of(
                firstFailureOnly("m1", List.of("t1", "t2"), "t1"), killedBy("m2", "t1", "t2"))), Set.of());

        assertEquals(List.of(List.of(0)), Subsumption.of(matrix).subsuming());
    }

    @Test
    void nothingCounted_hasNoScore() {
        assertEquals(true, Subsumption.of(KillMatrix.of(run(List.of(), List.of()), Set.of())).score().isEmpty());
    }
}
