package dev.changeling.review.export;

import dev.changeling.analysis.Score;
import dev.changeling.results.MutantResult;
import dev.changeling.results.RunResults;
import dev.changeling.review.Standing;
import dev.changeling.review.Survivors;
import java.util.List;
import java.util.Set;
import java.util.function.Predicate;

/** Standings for export tests: the listed equivalents and the marks given as plain sets and predicates. */
final class Standings {

    private Standings() {
    }

    static Standing of(RunResults results, Set<String> equivalent, Predicate<MutantResult> resolved) {
        return new Standing(results, Score.of(results.mutants(), equivalent),
                Survivors.unresolved(results.mutants(), resolved.or(mutant -> equivalent.contains(mutant.id()))),
                results.problems() == null ? List.of() : results.problems());
    }

    static Standing of(RunResults results, Predicate<MutantResult> resolved) {
        return of(results, Set.of(), resolved);
    }
}
