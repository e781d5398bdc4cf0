package dev.changeling.samples.orchard.crates;

/** One crate of picked apples: how many it holds, and how many of them are bruised. */
public final class Crate {

    /** Apples in a full crate. */
    public static final int CAPACITY = 40;

    private final int apples;
    private final int bruised;

    public Crate(int apples, int bruised) {
        if (apples < 0 || apples > CAPACITY) {
            throw new IllegalArgumentException("a crate holds 0 to " + CAPACITY + " apples, not " + apples);
        }
        if (bruised < 0 || bruised > apples) {
            throw new IllegalArgumentException("bruised apples must be among the crate's " + apples);
        }
        this.apples = apples;
        this.bruised = bruised;
    }

    public int apples() {
        return apples;
    }

    public int bruised() {
        return bruised;
    }

    /** The apples without a bruise. */
    public int sound() {
        return apples - bruised;
    }

    /** Whether the crate takes no more apples; only the stall's tests ask. */
    public boolean full() {
        return apples == CAPACITY;
    }
}
