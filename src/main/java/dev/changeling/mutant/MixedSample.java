package dev.changeling.mutant;

import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * A seeded sample of two orders, so that combined faults can be compared with their parts: {@code firstOrder}
 * first-order mutants and {@code higherOrder} mutants of order {@code order}, each drawn uniformly from its own order,
 * and then every first-order part of each drawn k-order mutant, whether the first draw picked it or not. Without its
 * parts in the run, "were all parts of this combined fault detected" could not be answered; they are counted apart
 * from the {@code firstOrder} drawn, so that those stay a uniform sample of the first-order mutants.
 *
 * @param firstOrder  first-order mutants to draw (0 for none beyond the parts)
 * @param higherOrder k-order mutants to draw; at least 1
 * @param order       their order, from {@link HigherOrder#MIN_ORDER} to {@link HigherOrder#MAX_ORDER}
 */
public record MixedSample(int firstOrder, int higherOrder, int order) {

    /** How the option's value is written: first-order count, k-order count, order. */
    public static final String FORM = "FIRST:HIGHER:ORDER";

    /** Keeps the two draws from shuffling alike under one seed: the 64-bit golden ratio, a usual mixing constant (common practice, no source). */
    private static final long SECOND_DRAW = 0x9E3779B97F4A7C15L;

    public MixedSample {
        if (firstOrder < 0) {
            throw new IllegalArgumentException("the first-order count cannot be negative: " + firstOrder);
        }
        if (higherOrder < 1) {
            throw new IllegalArgumentException("the k-order count must be at least 1, not " + higherOrder);
        }
        if (order < HigherOrder.MIN_ORDER || order > HigherOrder.MAX_ORDER) {
            throw new IllegalArgumentException("the order must be from " + HigherOrder.MIN_ORDER + " to "
                    + HigherOrder.MAX_ORDER + ", not " + order);
        }
    }

    /** Reads {@code 30:10:2}; an {@link IllegalArgumentException} says what is wrong. */
    public static MixedSample parse(String text) {
        String[] parts = text.strip().split(":", -1);
        if (parts.length != 3) {
            throw new IllegalArgumentException("three numbers are needed, " + FORM + " such as 30:10:2, not '" + text + "'");
        }
        try {
            return new MixedSample(Integer.parseInt(parts[0].strip()), Integer.parseInt(parts[1].strip()),
                    Integer.parseInt(parts[2].strip()));
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("three whole numbers are needed, " + FORM + " such as 30:10:2, not '" + text + "'");
        }
    }

    /** The orders to generate for it: first-order and its k. */
    public List<Integer> orders() {
        return List.of(1, order);
    }

    /** The sample of {@code population} (mutants of both orders), in the population's order; the same seed, the same sample. */
    public List<Mutant> pick(List<Mutant> population, long seed) {
        List<Mutant> drawnFirst = Sampling.pick(ofOrder(population, 1), firstOrder, seed);
        List<Mutant> drawnHigher = Sampling.pick(ofOrder(population, order), higherOrder, seed ^ SECOND_DRAW);
        Set<String> chosen = new HashSet<>();
        drawnFirst.forEach(mutant -> chosen.add(mutant.fingerprint()));
        for (Mutant combined : drawnHigher) {
            chosen.add(combined.fingerprint());
            combined.points().forEach(part -> chosen.add(part.fingerprint()));
        }
        return population.stream().filter(mutant -> chosen.contains(mutant.fingerprint())).toList();
    }

    /** One line on what {@link #pick} took from {@code population}: the two draws and the parts added to them. */
    public String describe(List<Mutant> picked, List<Mutant> population) {
        int drawnFirst = Math.min(firstOrder, ofOrder(population, 1).size());
        int drawnHigher = ofOrder(picked, order).size();
        int parts = ofOrder(picked, 1).size() - drawnFirst;
        return "mixed sample: " + drawnFirst + " first-order and " + drawnHigher + " of order " + order
                + " drawn, and " + parts + " first-order " + (parts == 1 ? "part" : "parts") + " of those added"
                + " (apart from the " + drawnFirst + "), so every part of each combined mutant runs too";
    }

    private static List<Mutant> ofOrder(List<Mutant> mutants, int wanted) {
        return mutants.stream().filter(mutant -> mutant.order() == wanted).toList();
    }
}
