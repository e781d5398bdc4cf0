package dev.changeling.samples.apiary;

/** A sudden loss of weight between two close readings means half the colony has just left with a new queen. */
public final class SwarmAlarm {

    /** A swarm takes roughly this much weight of bees and honey with it, or more. */
    static final int DROP_GRAMS = 1_500;

    /** Readings further apart than this can show a slow loss as well, which is not a swarm. */
    static final int MAX_MINUTES_APART = 60;

    private SwarmAlarm() {
    }

    public static boolean swarmed(long earlierGrams, long laterGrams, int minutesApart) {
        if (minutesApart <= 0 || minutesApart > MAX_MINUTES_APART) {
            return false;
        }
        return earlierGrams - laterGrams >= DROP_GRAMS;
    }
}
