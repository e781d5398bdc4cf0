package dev.changeling.mutant;

import dev.changeling.operator.MutationOperator;
import dev.changeling.operator.Operators;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The order in which a changed line's points are kept under a per-line budget: the operators whose mutants the
 * project's tests detected most often in its last full run first, then the catalogue's order, then the place in
 * the file, then the fingerprint, so the same tree and the same history always keep the same points.
 */
final class PointRanking {

    /** Below every ratio (they lie from 0 to 1): an operator without history ranks after those with one. */
    private static final double NO_HISTORY = -1;

    private PointRanking() {
    }

    /** @param killRatios each operator's share of detected mutants in the last full run, by id; empty when none */
    static Comparator<Point> of(Map<String, Double> killRatios) {
        Map<String, Integer> catalogue = catalogueOrder();
        return Comparator.<Point>comparingDouble(point -> -killRatios.getOrDefault(point.operator(), NO_HISTORY))
                .thenComparingInt(point -> catalogue.getOrDefault(point.operator(), Integer.MAX_VALUE))
                .thenComparing(Point::edit)
                .thenComparing(Point::fingerprint);
    }

    private static Map<String, Integer> catalogueOrder() {
        List<MutationOperator> all = Operators.all();
        Map<String, Integer> order = new HashMap<>();
        for (int i = 0; i < all.size(); i++) {
            order.put(all.get(i).id(), i);
        }
        return order;
    }
}
