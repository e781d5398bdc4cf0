package dev.changeling.mutant;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.source.Span;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;

class SamplingTest {

    private static List<Mutant> population(int size) {
        List<Mutant> mutants = new ArrayList<>();
        for (int i = 0; i < size; i++) {
            String id = String.format("%064x", i * 2654435761L);
            mutants.add(Mutant.firstOrder(new Point("F.java", "F", "m()", "op", HostKind.EXPRESSION,
                    new Span(i, i + 1), new Span(i, i + 1), "x", "y", "changed", 1, false, id)));
        }
        return mutants;
    }

    @Test
    void cochranSampleSizeForFivePercentAt95() {
        // Cochran W.G., Sampling Techniques, 3rd ed. (1977), ch. 4 (from memory): 1.96²·0.25/0.05² = 384.16 → 385.
        assertEquals(385, Sampling.sizeForMargin(0.05, 0.5, 0));
    }

    @Test
    void finitePopulationCorrectionShrinksTheSample() {
        // Cochran (1977) eq. 4.2 (from memory): n = n0 / (1 + (n0 − 1)/N); n0 = 384.15, N = 1000 → 277.5 → 278.
        assertEquals(278, Sampling.sizeForMargin(0.05, 0.5, 1000));
        // N = 40: 384.15 / (1 + 383.15/40) = 36.3 → 37, never more than the population.
        assertEquals(37, Sampling.sizeForMargin(0.05, 0.5, 40));
        assertEquals(1, Sampling.sizeForMargin(0.05, 0.5, 1));
    }

    @Test
    void marginOfFiftyMutantsIsAboutFourteenPoints() {
        // Normal approximation, CHECKS.md (Cochran 1977, from memory): ±0.139 for n = 50, p = 0.5 at 95%.
        double margin = Sampling.Z_95 * Math.sqrt(0.25 / 50);
        assertEquals(0.139, margin, 0.0005);
        assertTrue(Sampling.sizeForMargin(0.139, 0.5, 0) <= 50);
    }

    @Test
    void sameSeedSameSampleAndOriginalOrderKept() {
        List<Mutant> all = population(500);
        List<Mutant> one = Sampling.pick(all, 50, 42);
        assertEquals(one, Sampling.pick(all, 50, 42));
        assertEquals(50, one.size());
        List<Integer> positions = one.stream().map(all::indexOf).toList();
        assertEquals(positions.stream().sorted().toList(), positions);
    }

    @Test
    void everyMutantIsAboutEquallyLikelyToBePicked() {
        List<Mutant> all = population(40);
        int[] picked = new int[all.size()];
        int rounds = 4000;
        for (int seed = 0; seed < rounds; seed++) {
            for (Mutant mutant : Sampling.pick(all, 10, seed)) {
                picked[all.indexOf(mutant)]++;
            }
        }
        double expected = rounds * 10.0 / all.size();
        double chiSquare = IntStream.of(picked).mapToDouble(c -> (c - expected) * (c - expected) / expected).sum();
        // χ² with 39 degrees of freedom: the 99.9th percentile is about 72.1 (standard χ² tables, from memory).
        assertTrue(chiSquare < 72.1, "chi-square " + chiSquare);
    }
}
