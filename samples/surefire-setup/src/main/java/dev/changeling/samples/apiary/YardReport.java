package dev.changeling.samples.apiary;

import java.util.Locale;

/** One line per hive for the beekeeper's evening message, in kilograms or pounds. */
public final class YardReport {

    /** The international avoirdupois pound. */
    static final double GRAMS_PER_POUND = 453.59237;

    private YardReport() {
    }

    public static String line(String yard, Hive hive, long grossGrams, String units) {
        long net = Math.max(0, grossGrams - hive.tareGrams());
        return switch (units) {
            case "kg" -> String.format(Locale.ROOT, "%s/%s: %.1f kg", yard, hive.name(), net / 1000.0);
            case "lb" -> String.format(Locale.ROOT, "%s/%s: %.1f lb", yard, hive.name(), net / GRAMS_PER_POUND);
            default -> throw new IllegalArgumentException("units must be kg or lb, not " + units);
        };
    }
}
