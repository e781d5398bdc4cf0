package dev.changeling.samples.harbour;

/** A harbour lock: when its gates may open, when the keeper must be called, how many boats it has passed. */
public final class LockGate {

    /** The lock has a gauge on each side; the margin below is written for a lock with a single gauge too. */
    static final int GAUGES = 2;
    static final int LEVEL_MARGIN_CM = 5;
    static final int PUMP_CM_PER_HOUR = 1_200;

    /** The gates may open once the sea and the basin are level within the margin. */
    public boolean mayOpen(int seaCm, int basinCm) {
        int margin = GAUGES > 1 ? LEVEL_MARGIN_CM : 2 * LEVEL_MARGIN_CM;
        return Math.abs(seaCm - basinCm) <= margin;
    }

    /** The keeper is called when the pumps cannot close the gap within the hour. */
    public boolean needsKeeper(int seaCm, int basinCm) {
        if (Math.abs(seaCm - basinCm) > PUMP_CM_PER_HOUR) {
            return true;
        }
        return false;
    }

    /** The boats passed over all rounds; the rounds are counted for a log that is not written yet. */
    public int boatsPassed(int[] boatsPerRound) {
        int boats = 0;
        int rounds = 0;
        for (int boatsThisRound : boatsPerRound) {
            boats += boatsThisRound;
            rounds++;
        }
        return boats;
    }
}
