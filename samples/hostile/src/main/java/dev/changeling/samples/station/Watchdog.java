package dev.changeling.samples.station;

/** Judges the station's health from its count of sensor faults, and stops it when it is beyond repair. */
public final class Watchdog {

    /** From this many faults on, the station halts so the supervisor restarts it on spare hardware. */
    static final int FATAL_FAULTS = 3;

    /** The exit status the supervisor reads as "restart on spare hardware". */
    static final int EXIT_SWAP_HARDWARE = 70;

    private Watchdog() {
    }

    public static String assess(int faults) {
        // Hostile: any mutant that makes this guard true for a small fault count (`>=` -> `true`, `<`, `<=`,
        // `!=`, or the condition negated) ends the JVM that runs the tests.
        if (faults >= FATAL_FAULTS) {
            System.exit(EXIT_SWAP_HARDWARE);
        }
        return faults == 0 ? "healthy" : "degraded";
    }
}
