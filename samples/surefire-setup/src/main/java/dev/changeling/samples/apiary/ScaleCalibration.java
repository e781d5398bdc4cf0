package dev.changeling.samples.apiary;

/**
 * Turns a hive scale's raw load-cell counts into grams.
 *
 * @param zeroCounts         what the load cell reads with nothing on the platform
 * @param milligramsPerCount the weight of one count, from weighing a known mass
 */
public record ScaleCalibration(long zeroCounts, int milligramsPerCount) {

    public ScaleCalibration {
        if (milligramsPerCount <= 0) {
            throw new IllegalArgumentException("one count must weigh something, not " + milligramsPerCount + " mg");
        }
    }

    /** Grams on the platform; a reading below zero load (wind lifting the roof, a cold cell) counts as nothing. */
    public long grams(long rawCounts) {
        long counts = rawCounts - zeroCounts;
        if (counts < 0) {
            return 0;
        }
        return counts * milligramsPerCount / 1000;
    }
}
