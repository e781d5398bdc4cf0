package dev.changeling.samples.station;

/** Plans how an upload backlog is drained when the link comes back: a fixed number of readings per pass. */
public final class Backlog {

    private Backlog() {
    }

    /** Passes needed to send {@code readings} readings at {@code perPass} a pass. */
    public static int passesToDrain(int readings, int perPass) {
        if (perPass <= 0) {
            throw new IllegalArgumentException("a pass must send something, not " + perPass);
        }
        // Hostile: the mutant `readings <= 0` -> `readings == 0` misses the base case whenever readings is not a
        // multiple of perPass (the count steps from 1 straight to a negative number), and so do `false` and
        // `readings - perPass` -> `readings + perPass`: the recursion only ends in a StackOverflowError.
        if (readings <= 0) {
            return 0;
        }
        return 1 + passesToDrain(readings - perPass, perPass);
    }
}
