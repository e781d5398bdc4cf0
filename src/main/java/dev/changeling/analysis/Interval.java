package dev.changeling.analysis;

/** A two-sided confidence interval for a proportion; both ends lie in [0, 1]. */
public record Interval(double lower, double upper) {

    /** The 0.975 quantile of the standard normal distribution, for a two-sided 95% interval. */
    public static final double Z_95 = 1.959963984540054;

    public Interval {
        if (!(0 <= lower && lower <= upper && upper <= 1)) {
            throw new IllegalArgumentException("bad interval [" + lower + ", " + upper + "]");
        }
    }

    /** The 95% Wilson score interval, without continuity correction, of {@code successes} in {@code trials}. */
    public static Interval wilson95(int successes, int trials) {
        return wilson(successes, trials, Z_95);
    }

    /** The Wilson score interval, without continuity correction, for the normal quantile {@code z}. */
    public static Interval wilson(int successes, int trials, double z) {
        if (trials < 1 || successes < 0 || successes > trials) {
            throw new IllegalArgumentException("need 0 <= successes <= trials and trials >= 1, not "
                    + successes + " of " + trials);
        }
        double n = trials;
        double p = successes / n;
        double zz = z * z;
        double shrink = 1 + zz / n;
        double centre = (p + zz / (2 * n)) / shrink;
        double half = z / shrink * Math.sqrt(p * (1 - p) / n + zz / (4 * n * n));
        // At 0 or n successes the bound is exactly 0 or 1; rounding must not push it past.
        double lower = successes == 0 ? 0 : Math.max(0, centre - half);
        double upper = successes == trials ? 1 : Math.min(1, centre + half);
        return new Interval(lower, upper);
    }
}
