package dev.changeling.samples.station;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class SampleBufferTest {

    @Test
    void roundsUpToWholeChunks() {
        SampleBuffer buffer = new SampleBuffer();

        buffer.reserve(2 * SampleBuffer.CHUNK_BYTES + 1000);

        assertEquals(3, buffer.chunkCount());
    }

    @Test
    void aSecondReservationOnlyAddsWhatIsMissing() {
        SampleBuffer buffer = new SampleBuffer();
        buffer.reserve(SampleBuffer.CHUNK_BYTES);

        buffer.reserve(SampleBuffer.CHUNK_BYTES / 2);

        assertEquals(SampleBuffer.CHUNK_BYTES, buffer.reservedBytes());
    }
}
