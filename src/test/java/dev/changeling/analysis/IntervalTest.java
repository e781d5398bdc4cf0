package dev.changeling.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.stat.interval.ConfidenceInterval;
import org.apache.commons.math3.stat.interval.WilsonScoreInterval;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class IntervalTest {

    @Nested
    class PublishedExamples {

        // Newcombe R.G. (1998), "Two-sided confidence intervals for the single proportion: comparison of
        // seven methods", Statistics in Medicine 17:857-872, worked examples of the Wilson score
        // interval without continuity correction (from memory, recomputed), given to four places.
        @ParameterizedTest(name = "{0} of {1} -> {2} to {3}")
        @CsvSource({
            "81, 263, 0.2553, 0.3662",
            "15, 148, 0.0624, 0.1605",
            " 0,  20, 0.0000, 0.1611",
            " 1,  29, 0.0061, 0.1718",
        })
        void matchesNewcombe_toFourPlaces(int successes, int trials, double lower, double upper) {
            Interval interval = Interval.wilson95(successes, trials);

            assertEquals(lower, interval.lower(), 0.00005);
            assertEquals(upper, interval.upper(), 0.00005);
        }
    }

    @Nested
    class ReferenceLibrary {

        // Apache Commons Math 3.6.1, WilsonScoreInterval#createInterval(trials, successes, confidence).
        private final WilsonScoreInterval reference = new WilsonScoreInterval();

        @Test
        void matchesCommonsMath_overEverySuccessCount_forManyTrialCounts() {
            int[] trialCounts = {1, 2, 3, 5, 7, 10, 19, 20, 29, 50, 96, 148, 263, 385, 1000, 5000};
            int compared = 0;
            for (int trials : trialCounts) {
                for (int successes = 0; successes <= trials; successes++) {
                    ConfidenceInterval expected = reference.createInterval(trials, successes, 0.95);
                    Interval actual = Interval.wilson95(successes, trials);
                    String at = successes + " of " + trials;
                    assertEquals(expected.getLowerBound(), actual.lower(), 1e-12, "lower bound, " + at);
                    assertEquals(expected.getUpperBound(), actual.upper(), 1e-12, "upper bound, " + at);
                    compared++;
                }
            }
            assertEquals(7054, compared);
        }

        @Test
        void matchesCommonsMath_atOtherConfidenceLevels() {
            NormalDistribution normal = new NormalDistribution();
            for (double confidence : new double[] {0.80, 0.90, 0.99}) {
                double z = normal.inverseCumulativeProbability(1 - (1 - confidence) / 2);
                ConfidenceInterval expected = reference.createInterval(40, 31, confidence);
                Interval actual = Interval.wilson(31, 40, z);
                assertEquals(expected.getLowerBound(), actual.lower(), 1e-12, "lower at " + confidence);
                assertEquals(expected.getUpperBound(), actual.upper(), 1e-12, "upper at " + confidence);
            }
        }

        @Test
        void zConstant_isTheNormalQuantile() {
            assertEquals(new NormalDistribution().inverseCumulativeProbability(0.975), Interval.Z_95, 1e-15);
        }
    }

    @Nested
    class Bounds {

        @Test
        void noSuccesses_startsAtExactlyZero() {
            assertEquals(0.0, Interval.wilson95(0, 20).lower());
        }

        @Test
        void allSuccesses_endsAtExactlyOne() {
            assertEquals(1.0, Interval.wilson95(20, 20).upper());
        }

        @Test
        void containsTheObservedProportion() {
            for (int successes = 0; successes <= 37; successes++) {
                Interval interval = Interval.wilson95(successes, 37);
                double observed = successes / 37.0;
                assertTrue(interval.lower() <= observed && observed <= interval.upper(), successes + " of 37");
            }
        }

        @Test
        void noTrials_isRefused() {
            assertThrows(IllegalArgumentException.class, () -> Interval.wilson95(0, 0));
        }

        @Test
        void moreSuccessesThanTrials_isRefused() {
            assertThrows(IllegalArgumentException.class, () -> Interval.wilson95(6, 5));
        }
    }
}
