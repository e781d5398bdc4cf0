package dev.changeling.samples.station;

import java.util.ArrayList;
import java.util.List;

/** Memory the station sets aside for readings while the upload link is down, taken in whole chunks. */
public final class SampleBuffer {

    /** One chunk of buffer memory. */
    public static final int CHUNK_BYTES = 1 << 20;

    private final List<byte[]> chunks = new ArrayList<>();
    private long reservedBytes;

    /** Grows the buffer until it holds at least {@code wantedBytes}. */
    public void reserve(long wantedBytes) {
        // Hostile: the mutant `<` -> `!=` never stops when wantedBytes is not a multiple of a chunk (the total
        // jumps over it), nor does `reservedBytes += CHUNK_BYTES` -> `-=`: both allocate until OutOfMemoryError.
        while (reservedBytes < wantedBytes) {
            chunks.add(new byte[CHUNK_BYTES]);
            reservedBytes += CHUNK_BYTES;
        }
    }

    public int chunkCount() {
        return chunks.size();
    }

    public long reservedBytes() {
        return reservedBytes;
    }
}
