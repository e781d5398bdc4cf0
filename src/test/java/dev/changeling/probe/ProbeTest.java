package dev.changeling.probe;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;

import java.util.Arrays;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;

/**
 * The notes of entry: every entered method is listed once per drain, whether or not reach is recorded; while it is,
 * the entry is also reach, past the points and their infections.
 */
class ProbeTest {

    @AfterEach
    void switchOff() {
        Probe.record(false);
        Probe.prepare(0, 0);
    }

    @Test
    void enteredMethods_areListedOncePerDrain_inTheOrderFirstEntered() {
        Probe.prepare(3, 4);
        Probe.enter(2);
        Probe.enter(0);
        Probe.enter(2);
        assertArrayEquals(new int[] {2, 0}, Probe.drainEntered());
        assertArrayEquals(new int[0], Probe.drainEntered());
        Probe.enter(2);
        assertArrayEquals(new int[] {2}, Probe.drainEntered());
        assertArrayEquals(new int[0], Probe.drainReached(), "without recording, an entry is not reach");
    }

    @Test
    void whileReachIsRecorded_anEntryIsReachPastThePointsAndTheirInfections() {
        Probe.prepare(3, 4);
        Probe.record(true);
        Probe.on(1);
        Probe.enter(3);
        int[] reached = Probe.drainReached();
        Arrays.sort(reached);
        assertArrayEquals(new int[] {1, 2 * 3 + 3}, reached);
        assertArrayEquals(new int[] {3}, Probe.drainEntered());
    }

    @Test
    void anIdBeyondThePreparedMethods_isIgnored() {
        Probe.prepare(1, 2);
        Probe.enter(5);
        assertArrayEquals(new int[0], Probe.drainEntered());
    }
}
