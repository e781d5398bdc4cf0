package dev.changeling.review;

import dev.changeling.results.MutantResult;
import dev.changeling.results.Verdict;
import java.util.Comparator;
import java.util.List;
import java.util.function.Predicate;

/** Picks the survivors a reviewer still has to look at, in file and position order. */
public final class Survivors {

    public static final Comparator<MutantResult> IN_FILE_ORDER = Comparator.comparing(MutantResult::file)
            .thenComparingInt(mutant -> mutant.first().line())
            .thenComparingInt(mutant -> mutant.first().column())
            .thenComparingInt(MutantResult::order)
            .thenComparing(MutantResult::id);

    /**
     * The clearest findings first: a survivor that more tests run and still miss says most plainly that
     * the code is run but not checked. Ties keep file order.
     */
    public static final Comparator<MutantResult> WORST_FIRST = Comparator
            .comparingInt((MutantResult mutant) -> mutant.reachedBy() == null ? 0 : mutant.reachedBy().size()).reversed()
            .thenComparing(IN_FILE_ORDER);

    private Survivors() {
    }

    /**
     * The mutants that survived and are not resolved.
     *
     * @param resolved whether triage has settled a mutant (known equivalent, or marked fixed locally)
     */
    public static List<MutantResult> unresolved(List<MutantResult> mutants, Predicate<MutantResult> resolved) {
        return mutants.stream()
                .filter(mutant -> mutant.verdict() == Verdict.SURVIVED)
                .filter(resolved.negate())
                .sorted(IN_FILE_ORDER)
                .toList();
    }
}
