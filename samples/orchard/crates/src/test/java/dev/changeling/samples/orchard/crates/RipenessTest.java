package dev.changeling.samples.orchard.crates;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class RipenessTest {

    @Test
    void lowScoresAreGreen_middleOnesReady_highOnesOverripe() {
        assertEquals(Ripeness.GREEN, Ripeness.ofScore(2));
        assertEquals(Ripeness.READY, Ripeness.ofScore(5));
        assertEquals(Ripeness.OVERRIPE, Ripeness.ofScore(8));
    }
}
