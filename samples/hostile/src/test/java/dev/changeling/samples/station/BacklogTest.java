package dev.changeling.samples.station;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class BacklogTest {

    @Test
    void aPartPassCountsAsAPass() {
        assertEquals(3, Backlog.passesToDrain(250, 100));
    }

    @Test
    void exactPassesNeedNoExtraOne() {
        assertEquals(2, Backlog.passesToDrain(200, 100));
    }

    @Test
    void rejectsAnEmptyPass() {
        assertThrows(IllegalArgumentException.class, () -> Backlog.passesToDrain(10, 0));
    }
}
