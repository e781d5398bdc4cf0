package dev.changeling.samples.harbour;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class SumpPumpTest {

    private final SumpPump pump = new SumpPump();

    @Test
    void runsWhileTheFloatHangsDown() {
        assertTrue(pump.runs(true));
    }

    @Test
    void stopsOnceTheSumpIsFull() {
        assertFalse(pump.runs(false));
    }
}
