package dev.changeling.analysis;

import static dev.changeling.analysis.Made.mutant;
import static dev.changeling.analysis.Made.withVerdict;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.results.MutantResult;
import dev.changeling.results.Verdict;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;

class LineCoverageTest {

    /**
     * A.java line 10: one killed, one survivor, one unreached (the line is run: a test reaches the others); line 11: one
     * unreached; line 12: only a stillborn, so not a mutated line. B.java line 5: one unreached.
     */
    private static final List<MutantResult> MUTANTS = List.of(
            mutant("a10k", "A.java", 10, List.of("t1"), List.of("t1")),
            mutant("a10s", "A.java", 10, List.of("t1"), List.of()),
            mutant("a10u", "A.java", 10, List.of(), List.of()),
            mutant("a11u", "A.java", 11, List.of(), List.of()),
            withVerdict(mutant("a12x", "A.java", 12, List.of("t1"), List.of()), Verdict.STILLBORN),
            mutant("b5u", "B.java", 5, List.of(), List.of()));

    @Test
    void aLineIsRun_whenAnyMutantOnItIsReached_andItsUndetectedMutantsAreUnnoticed() {
        assertEquals(new LineCoverage(3, 1, 2), LineCoverage.of(MUTANTS, Set.of()));
        assertEquals(1.0 / 3, LineCoverage.of(MUTANTS, Set.of()).share().getAsDouble(), 1e-12);
    }

    @Test
    void perFile() {
        assertEquals(Map.of("A.java", new LineCoverage(2, 1, 2), "B.java", new LineCoverage(1, 0, 0)),
                LineCoverage.byFile(MUTANTS, Set.of()));
    }

    @Test
    void equivalentMutants_areLeftOut() {
        assertEquals(new LineCoverage(3, 1, 1), LineCoverage.of(MUTANTS, Set.of("a10s")));
        // A killed mutant is never equivalent, so line 10 stays a run line.
        assertEquals(new LineCoverage(3, 1, 0), LineCoverage.of(MUTANTS, Set.of("a10s", "a10k", "a10u")));
    }

    @Test
    void noCountedMutant_hasNoShare() {
        assertTrue(LineCoverage.of(List.of(), Set.of()).share().isEmpty());
    }
}
