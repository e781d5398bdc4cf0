package dev.changeling.analysis;

import static dev.changeling.analysis.Made.higherOrder;
import static dev.changeling.analysis.Made.mutant;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.results.MutantResult;
import dev.changeling.results.Verdict;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;

class CouplingTest {

    private static final MutantResult F1 = mutant("f1", "Till.java", 10, List.of("t1"), List.of("t1"));
    private static final MutantResult F2 = mutant("f2", "Till.java", 11, List.of("t1"), List.of("t1"));
    private static final MutantResult F3 = mutant("f3", "Till.java", 12, List.of("t1"), List.of());

    @Test
    void onlyMutantsWhosePartsAreAllPresentAndDetected_count_andTheLiveOnesAreSubtle() {
        MutantResult coupled = higherOrder("h-both", Verdict.KILLED, "f1", "f2");
        MutantResult subtle = higherOrder("h-subtle", Verdict.SURVIVED, "f2", "f1");
        MutantResult partAlive = higherOrder("h-alive-part", Verdict.SURVIVED, "f1", "f3");
        MutantResult partMissing = higherOrder("h-missing", Verdict.KILLED, "f1", "not-in-the-run");

        Coupling coupling = Coupling.of(List.of(F1, F2, F3, coupled, subtle, partAlive, partMissing), Set.of());

        assertEquals(2, coupling.eligible());
        assertEquals(1, coupling.detected());
        assertEquals(List.of(subtle), coupling.subtle());
        assertEquals(2, coupling.incomplete());
        assertEquals(0.5, coupling.ratio().getAsDouble());
    }

    @Test
    void aThirdOrderMutant_needsAllThreeParts() {
        MutantResult third = higherOrder("h3", Verdict.TIMED_OUT, "f1", "f2", "f3");
        MutantResult f3Killed = mutant("f3", "Till.java", 12, List.of("t1"), List.of("t1"));

        assertEquals(0, Coupling.of(List.of(F1, F2, F3, third), Set.of()).eligible());
        assertEquals(1, Coupling.of(List.of(F1, F2, f3Killed, third), Set.of()).detected());
    }

    @Test
    void stillbornAndEquivalentCombinations_areLeftOut() {
        MutantResult stillborn = higherOrder("h-stillborn", Verdict.STILLBORN, "f1", "f2");
        MutantResult listed = higherOrder("h-listed", Verdict.SURVIVED, "f1", "f2");

        Coupling coupling = Coupling.of(List.of(F1, F2, stillborn, listed), Set.of("h-listed"));

        assertEquals(0, coupling.eligible());
        assertTrue(coupling.ratio().isEmpty());
    }
}
