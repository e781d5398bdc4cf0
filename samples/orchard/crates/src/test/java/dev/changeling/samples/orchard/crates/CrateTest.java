package dev.changeling.samples.orchard.crates;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class CrateTest {

    @Test
    void theSoundApplesAreThoseWithoutABruise() {
        assertEquals(7, new Crate(10, 3).sound());
    }

    @Test
    void moreBruisedApplesThanApples_isRefused() {
        assertThrows(IllegalArgumentException.class, () -> new Crate(5, 6));
    }

    @Test
    void aCrateOverItsCapacity_isRefused() {
        assertThrows(IllegalArgumentException.class, () -> new Crate(41, 0));
    }
}
