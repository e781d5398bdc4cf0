package dev.changeling.samples.apiary;

/** Says how much honey a hive can spare and when it needs another box on top. */
public final class HarvestAdvisor {

    /** Honey is taken off in whole half-kilos. */
    static final int STEP_GRAMS = 500;

    /** Fewer free frames than this in a good flow and the bees run out of room. */
    static final int MIN_FREE_FRAMES = 3;

    private final int winterStoreGrams;

    /** @param winterStoreGrams honey left in the hive for the colony to live on over winter */
    public HarvestAdvisor(int winterStoreGrams) {
        if (winterStoreGrams < 0) {
            throw new IllegalArgumentException("a winter store cannot be negative: " + winterStoreGrams + " g");
        }
        this.winterStoreGrams = winterStoreGrams;
    }

    /** What the hive holds above its empty boxes and the winter store, rounded down to whole half-kilos. */
    public long harvestableGrams(long grossGrams, Hive hive) {
        long surplus = grossGrams - hive.tareGrams() - winterStoreGrams;
        if (surplus < STEP_GRAMS) {
            return 0;
        }
        return surplus / STEP_GRAMS * STEP_GRAMS;
    }

    /** Another box goes on when the flow is at least the main flow and the bees are short of room. */
    public boolean needsAnotherBox(NectarFlow flow, int freeFrames) {
        return flow.compareTo(NectarFlow.MAIN) >= 0 && freeFrames < MIN_FREE_FRAMES;
    }
}
