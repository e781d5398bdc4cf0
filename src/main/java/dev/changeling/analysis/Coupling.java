package dev.changeling.analysis;

import dev.changeling.results.MutantResult;
import dev.changeling.results.PointRecord;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.Set;

/**
 * Combined faults: for each higher-order mutant whose first-order parts are all in the run and all detected (a part is
 * found by its point's fingerprint, which is the first-order mutant's id), whether the combination was detected too.
 * The coupling ratio is the detected ones over all such mutants; the subtle ones are those still alive although every
 * part alone is detected.
 *
 * @param eligible   counted, non-equivalent higher-order mutants whose parts are all present and detected
 * @param detected   of those, the detected ones
 * @param subtle     of those, the undetected ones, in the results' order
 * @param incomplete counted, non-equivalent higher-order mutants left out because a part is missing or undetected
 */
public record Coupling(int eligible, int detected, List<MutantResult> subtle, int incomplete) {

    public Coupling {
        subtle = List.copyOf(subtle);
    }

    public static Coupling of(List<MutantResult> mutants, Set<String> equivalent) {
        Map<String, MutantResult> firstOrder = new HashMap<>();
        for (MutantResult mutant : mutants) {
            if (mutant.order() == 1) {
                firstOrder.put(mutant.id(), mutant);
            }
        }
        int eligible = 0;
        int detected = 0;
        int incomplete = 0;
        List<MutantResult> subtle = new ArrayList<>();
        for (MutantResult mutant : mutants) {
            if (mutant.order() < 2 || !mutant.verdict().counted() || Score.isEquivalent(mutant, equivalent)) {
                continue;
            }
            if (!everyPartDetected(mutant, firstOrder)) {
                incomplete++;
                continue;
            }
            eligible++;
            if (mutant.verdict().detected()) {
                detected++;
            } else {
                subtle.add(mutant);
            }
        }
        return new Coupling(eligible, detected, subtle, incomplete);
    }

    private static boolean everyPartDetected(MutantResult mutant, Map<String, MutantResult> firstOrder) {
        for (PointRecord point : mutant.points()) {
            MutantResult part = firstOrder.get(point.fingerprint());
            if (part == null || !part.verdict().detected()) {
                return false;
            }
        }
        return true;
    }

    /** Detected over eligible; empty when no higher-order mutant is eligible. */
    public OptionalDouble ratio() {
        return eligible == 0 ? OptionalDouble.empty() : OptionalDouble.of((double) detected / eligible);
    }
}
