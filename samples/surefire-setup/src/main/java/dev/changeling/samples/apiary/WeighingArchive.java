package dev.changeling.samples.apiary;

/** The last readings of one scale, as many as it was made for; the oldest gives way to the newest. */
public final class WeighingArchive {

    private final long[] grams;
    private int next;
    private int count;

    /** Takes all its memory at once, so an archive too large for the heap fails here and not months later. */
    public WeighingArchive(int capacity) {
        if (capacity <= 0) {
            throw new IllegalArgumentException("an archive must hold at least one reading, not " + capacity);
        }
        grams = new long[capacity];
    }

    public void add(long reading) {
        grams[next] = reading;
        next = (next + 1) % grams.length;
        if (count < grams.length) {
            count++;
        }
    }

    public int size() {
        return count;
    }

    /** The mean of the readings held, rounded down. */
    public long averageGrams() {
        if (count == 0) {
            throw new IllegalStateException("no readings yet");
        }
        long sum = 0;
        for (int index = 0; index < count; index++) {
            sum += grams[index];
        }
        return sum / count;
    }
}
