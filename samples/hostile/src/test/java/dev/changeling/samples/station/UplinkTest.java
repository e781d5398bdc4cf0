package dev.changeling.samples.station;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class UplinkTest {

    @Test
    void wholeBatchesNeedNoExtraUpload() {
        assertEquals(2, Uplink.uploadsFor(10, 5));
    }

    @Test
    void aShortLastBatchIsOneMoreUpload() {
        assertEquals(2, Uplink.uploadsFor(7, 5));
    }

    @Test
    void linksOnTheAttemptAfterTheFailures() {
        assertEquals(3, Uplink.attemptsUntilLinked(2));
        assertEquals(1, Uplink.attemptsUntilLinked(0));
    }
}
