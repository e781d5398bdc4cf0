package dev.changeling.mutant;

import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;

/** Seeded uniform sampling of mutants, and the sample size that gives a wanted margin. */
public final class Sampling {

    /** z for a two-sided 95% interval. */
    public static final double Z_95 = 1.959963984540054;

    private Sampling() {
    }

    /** {@code size} mutants chosen uniformly without replacement; the same seed gives the same choice. */
    public static List<Mutant> pick(List<Mutant> mutants, int size, long seed) {
        if (size < 0) {
            throw new IllegalArgumentException("a sample size cannot be negative: " + size);
        }
        if (size >= mutants.size()) {
            return mutants;
        }
        List<Mutant> order = new ArrayList<>(mutants);
        order.sort(Comparator.comparing(Mutant::fingerprint));
        Collections.shuffle(order, new Random(seed));
        Set<String> chosen = new HashSet<>();
        order.subList(0, size).forEach(mutant -> chosen.add(mutant.fingerprint()));
        return mutants.stream().filter(mutant -> chosen.contains(mutant.fingerprint())).toList();
    }

    /**
     * Cochran's sample size for a proportion at 95%, n0 = z²·p(1−p)/e² rounded up, with the finite
     * population correction n = n0 / (1 + (n0 − 1)/N) when the population is known (N > 0).
     */
    public static int sizeForMargin(double margin, double expectedProportion, long population) {
        if (!(margin > 0 && margin < 1)) {
            throw new IllegalArgumentException("the margin must lie between 0 and 1, not " + margin);
        }
        double p = expectedProportion;
        double n0 = Z_95 * Z_95 * p * (1 - p) / (margin * margin);
        if (population <= 0) {
            return (int) Math.ceil(n0 - 1e-9);
        }
        double n = n0 / (1 + (n0 - 1) / population);
        return (int) Math.min(population, Math.ceil(n - 1e-9));
    }
}
