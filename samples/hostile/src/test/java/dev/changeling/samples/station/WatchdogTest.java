package dev.changeling.samples.station;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class WatchdogTest {

    @Test
    void noFaultsIsHealthy() {
        assertEquals("healthy", Watchdog.assess(0));
    }

    @Test
    void aFewFaultsAreDegraded() {
        assertEquals("degraded", Watchdog.assess(2));
    }

    @Test
    void oneFaultMoreIsSurvivableOnlyBelowTheFatalCount() {
        assertTrue(Watchdog.outlastsAnotherFault(1));
        assertFalse(Watchdog.outlastsAnotherFault(2));
    }
}
