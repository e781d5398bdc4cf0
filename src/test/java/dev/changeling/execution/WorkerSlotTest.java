package dev.changeling.execution;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class WorkerSlotTest {

    private static JobResult killedWith(String message) {
        return new JobResult("m", Outcome.KILLED, "t", message, List.of(), 1);
    }

    /** The text is HotSpot's own, seen in this JVM: an array of Integer.MAX_VALUE ints is refused before allocating. */
    @Test
    void anArrayBeyondTheJvmsLimit_leavesTheHeapAsItWas_andKeepsTheWorker() {
        String refused;
        try {
            int[] huge = new int[Integer.MAX_VALUE];
            refused = "allocated " + huge.length;
        } catch (OutOfMemoryError error) {
            refused = "OutOfMemoryError: " + error.getMessage();
        }
        assertEquals(WorkerSlot.ARRAY_BEYOND_LIMIT, refused);
        assertFalse(WorkerSlot.exhaustedMemory(killedWith(refused)));
    }

    @Test
    void aHeapThatRanOut_replacesTheWorker() {
        assertTrue(WorkerSlot.exhaustedMemory(killedWith("OutOfMemoryError: Java heap space")));
        assertFalse(WorkerSlot.exhaustedMemory(killedWith("AssertionFailedError: expected: <1> but was: <2>")));
    }
}
