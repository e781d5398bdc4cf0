package dev.changeling.analysis;

import dev.changeling.results.MutantResult;
import dev.changeling.results.Verdict;
import java.util.Collections;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.SortedMap;
import java.util.TreeMap;

/**
 * The mutation score of a set of results: detected / (all − stillborn − skipped − equivalent), where
 * detected = killed + timed out + crashed; overall, per file, per operator and order, and per order.
 *
 * <p>A mutant on the equivalents list counts as equivalent only while undetected (survived or
 * unreached): a test that tells a mutant apart shows it is not equivalent, and stillborn or skipped
 * mutants are out of the score already.
 */
public final class Score {

    /** The key of the per-operator figures: the operator of a mutant's first point, and the mutant's order. */
    public record OperatorOrder(String operator, int order) {
        static final Comparator<OperatorOrder> ORDER = Comparator.comparing(OperatorOrder::operator)
                .thenComparingInt(OperatorOrder::order);
    }

    private final Tally overall;
    private final SortedMap<String, Tally> byFile;
    private final SortedMap<OperatorOrder, Tally> byOperator;
    private final SortedMap<Integer, Tally> byOrder;
    private final Set<String> equivalent;

    private Score(Tally overall, SortedMap<String, Tally> byFile, SortedMap<OperatorOrder, Tally> byOperator,
                  SortedMap<Integer, Tally> byOrder, Set<String> equivalent) {
        this.overall = overall;
        this.equivalent = Set.copyOf(equivalent);
        this.byFile = Collections.unmodifiableSortedMap(byFile);
        this.byOperator = Collections.unmodifiableSortedMap(byOperator);
        this.byOrder = Collections.unmodifiableSortedMap(byOrder);
    }

    /**
     * @param mutants    the results to score
     * @param equivalent the fingerprints (full ids) of mutants known to be equivalent
     */
    public static Score of(List<MutantResult> mutants, Set<String> equivalent) {
        Tally overall = Tally.empty();
        SortedMap<String, Tally> byFile = new TreeMap<>();
        SortedMap<OperatorOrder, Tally> byOperator = new TreeMap<>(OperatorOrder.ORDER);
        SortedMap<Integer, Tally> byOrder = new TreeMap<>();
        for (MutantResult mutant : mutants) {
            boolean isEquivalent = isEquivalent(mutant, equivalent);
            overall = overall.plus(mutant.verdict(), isEquivalent);
            add(byFile, mutant.file(), mutant, isEquivalent);
            add(byOperator, new OperatorOrder(mutant.first().operator(), mutant.order()), mutant, isEquivalent);
            add(byOrder, mutant.order(), mutant, isEquivalent);
        }
        return new Score(overall, byFile, byOperator, byOrder, equivalent);
    }

    /** Whether this mutant is left out of the score as equivalent. */
    public static boolean isEquivalent(MutantResult mutant, Set<String> equivalent) {
        Verdict verdict = mutant.verdict();
        return (verdict == Verdict.SURVIVED || verdict == Verdict.UNREACHED) && equivalent.contains(mutant.id());
    }

    /** The fingerprints of the mutants known to be equivalent that this score was given. */
    public Set<String> equivalent() {
        return equivalent;
    }

    public Tally overall() {
        return overall;
    }

    /** By project-relative path. */
    public SortedMap<String, Tally> byFile() {
        return byFile;
    }

    /** By the operator of each mutant's first point and the mutant's order; sorted by operator, then order. */
    public SortedMap<OperatorOrder, Tally> byOperator() {
        return byOperator;
    }

    /** By mutant order: 1 for first-order, k for k-order. */
    public SortedMap<Integer, Tally> byOrder() {
        return byOrder;
    }

    private static <K> void add(Map<K, Tally> groups, K key, MutantResult mutant, boolean isEquivalent) {
        groups.compute(key, (unused, tally) -> (tally == null ? Tally.empty() : tally).plus(mutant.verdict(), isEquivalent));
    }
}
