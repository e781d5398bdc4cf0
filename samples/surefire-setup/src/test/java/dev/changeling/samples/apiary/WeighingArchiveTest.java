package dev.changeling.samples.apiary;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class WeighingArchiveTest {

    @Test
    void keepsOnlyTheNewestReadings() {
        WeighingArchive archive = new WeighingArchive(3);
        for (long reading : new long[] {40_000, 41_000, 42_000, 43_000}) {
            archive.add(reading);
        }

        assertEquals(3, archive.size());
        // 43,000 replaced 40,000: (43,000 + 41,000 + 42,000) / 3
        assertEquals(42_000, archive.averageGrams());
    }

    @Test
    void hasNoAverageBeforeItsFirstReading() {
        assertThrows(IllegalStateException.class, () -> new WeighingArchive(4).averageGrams());
    }

    /**
     * No JVM holds a long array of Integer.MAX_VALUE elements ("Requested array size exceeds VM limit"), whatever
     * its heap: the error comes at once, and the test expects it.
     */
    @Test
    void anArchiveNoJvmCanHold_failsAtOnce() {
        assertThrows(OutOfMemoryError.class, () -> new WeighingArchive(Integer.MAX_VALUE));
    }
}
