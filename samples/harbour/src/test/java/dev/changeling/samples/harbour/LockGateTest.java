package dev.changeling.samples.harbour;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class LockGateTest {

    private final LockGate gate = new LockGate();

    @Test
    void opensWhenLevelWithinTheMargin() {
        assertTrue(gate.mayOpen(400, 403));
        assertTrue(gate.mayOpen(403, 400));
    }

    @Test
    void staysShutBeyondTheMargin() {
        assertFalse(gate.mayOpen(400, 408));
    }

    @Test
    void noKeeperForASmallGap() {
        assertFalse(gate.needsKeeper(400, 450));
    }

    @Test
    void aWideGapIsHandled() {
        assertDoesNotThrow(() -> gate.needsKeeper(0, 2_000));
    }

    @Test
    void countsEveryBoat() {
        assertEquals(7, gate.boatsPassed(new int[] {3, 4}));
    }

    @Test
    void countsASingleRound() {
        assertEquals(5, gate.boatsPassed(new int[] {5}));
    }
}
