package dev.changeling.samples.orchard.crates;

/** How ripe a row's apples are, from the 1-to-8 score the pickers note on each row's board. */
public enum Ripeness {
    GREEN, READY, OVERRIPE;

    public static Ripeness ofScore(int score) {
        if (score < 1 || score > 8) {
            throw new IllegalArgumentException("a ripeness score is 1 to 8, not " + score);
        }
        if (score <= 4) {
            return GREEN;
        }
        if (score <= 6) {
            return READY;
        }
        return OVERRIPE;
    }
}
