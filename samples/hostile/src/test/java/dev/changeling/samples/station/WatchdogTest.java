package dev.changeling.samples.station;

import static org.junit.jupiter.api.Assertions.assertEquals;

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
}
