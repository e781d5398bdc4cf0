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

    /** Whether the station keeps running after one more fault. */
    public static boolean outlastsAnotherFault(int faults) {
        // Hostile: the plus below is a Unicode escape, which javac decodes before it reads anything (JLS §3.3), so
        // the written text of this comparison is not the text it means. The file is mutated all the same; only
        // code whose text holds the escape gets no mutant.
        return faults \u002B 1 < FATAL_FAULTS;
    }
}
