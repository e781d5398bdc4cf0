package dev.changeling.samples.station;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class ReadingScheduleTest {

    @Test
    void aMinuteHoldsFourReadingsAtFifteenSeconds() {
        assertEquals(4, ReadingSchedule.readingsDue(120, 180, 15));
    }

    @Test
    void theEndSecondIsNotIncluded() {
        assertEquals(1, ReadingSchedule.readingsDue(0, 15, 15));
    }

    @Test
    void rejectsAnIntervalOfZero() {
        assertThrows(IllegalArgumentException.class, () -> ReadingSchedule.readingsDue(0, 60, 0));
    }
}
