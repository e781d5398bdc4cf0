package dev.changeling.samples.apiary;

/** How much the bees bring in, judged from a hive's weight gain over one day. */
public enum NectarFlow {
    /** The colony eats more than it brings in. */
    DEARTH,
    LIGHT,
    MAIN,
    STRONG;

    static final int MAIN_FROM_GRAMS = 500;
    static final int STRONG_FROM_GRAMS = 2_000;

    public static NectarFlow ofDailyGain(int gramsPerDay) {
        if (gramsPerDay <= 0) {
            return DEARTH;
        }
        if (gramsPerDay < MAIN_FROM_GRAMS) {
            return LIGHT;
        }
        if (gramsPerDay < STRONG_FROM_GRAMS) {
            return MAIN;
        }
        return STRONG;
    }
}
