package dev.changeling.samples.greenhouse;

/**
 * One bed of plants behind one valve, with the soil moisture below which it needs water.
 *
 * @param name            the label on the valve, unique within a greenhouse
 * @param dryBelowPercent soil moisture (0–100 %) below which the bed is watered
 * @param baseSeconds     how long the valve stays open for a bed that is only just dry
 * @param seedlings       young plants: watered gently and never skipped to save money
 */
public record Zone(String name, int dryBelowPercent, int baseSeconds, boolean seedlings) {

    /** No valve stays open longer than this in one go, whatever the sensor says. */
    public static final int MAX_SECONDS = 600;

    /** Each percentage point of moisture missing adds this many seconds of water. */
    static final int SECONDS_PER_MISSING_PERCENT = 4;

    public Zone {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a zone needs a name");
        }
        if (dryBelowPercent < 0 || dryBelowPercent > 100) {
            throw new IllegalArgumentException("moisture threshold of " + name + " must be 0-100 %, not " + dryBelowPercent);
        }
        if (baseSeconds <= 0 || baseSeconds > MAX_SECONDS) {
            throw new IllegalArgumentException("base watering of " + name + " must be 1-" + MAX_SECONDS + " s, not " + baseSeconds);
        }
    }

    public boolean needsWater(int moisturePercent) {
        return moisturePercent < dryBelowPercent;
    }

    /** The drier the soil, the longer the valve stays open; seedlings get half as much, more often. */
    public int wateringSeconds(int moisturePercent) {
        int missing = Math.max(0, dryBelowPercent - moisturePercent);
        int seconds = baseSeconds + missing * SECONDS_PER_MISSING_PERCENT;
        if (seedlings) {
            seconds = seconds / 2;
        }
        return Math.min(seconds, MAX_SECONDS);
    }

    /** Soil this far below the threshold cannot wait for cheaper water. */
    public boolean critical(int moisturePercent) {
        return dryBelowPercent - moisturePercent >= 15;
    }
}
