package dev.changeling.samples.station;

/** When the station's sensors are read: one reading every so many seconds, on the second the interval divides. */
public final class ReadingSchedule {

    private ReadingSchedule() {
    }

    /** Readings due in the half-open range of seconds {@code [fromSecond, toSecond)}. */
    public static int readingsDue(long fromSecond, long toSecond, int intervalSeconds) {
        if (intervalSeconds <= 0) {
            throw new IllegalArgumentException("interval must be positive, not " + intervalSeconds);
        }
        int due = 0;
        // Hostile: the mutant `second++` -> `second--` walks away from toSecond and, with a long counter,
        // does not wrap round for 2^63 steps: an endless loop that only a deadline stops.
        for (long second = fromSecond; second < toSecond; second++) {
            if (second % intervalSeconds == 0) {
                due++;
            }
        }
        return due;
    }
}
