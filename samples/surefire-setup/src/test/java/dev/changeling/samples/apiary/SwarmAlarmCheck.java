package dev.changeling.samples.apiary;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Named so that only the pom's own include patterns pick it up. */
class SwarmAlarmCheck {

    @Test
    void twoKilosGoneInHalfAnHourIsASwarm() {
        assertTrue(SwarmAlarm.swarmed(42_000, 40_000, 30));
    }

    @Test
    void aSmallDropIsBeesOutForaging() {
        assertFalse(SwarmAlarm.swarmed(42_000, 41_600, 30));
    }

    @Test
    void readingsADayApartSayNothing() {
        assertFalse(SwarmAlarm.swarmed(42_000, 38_000, 24 * 60));
    }
}
