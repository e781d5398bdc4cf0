package dev.changeling.samples.kiln;

import static org.junit.Assert.assertEquals;
import static org.junit.Assert.assertThrows;

import org.junit.Test;

public class SegmentTest {

    @Test
    public void rampsAHundredDegreesAtAHundredPerHourInAnHour() {
        assertEquals(60, new Segment(100, 120, 0).rampMinutes(20));
    }

    @Test
    public void roundsAPartMinuteUp() {
        // 10 °C at 150 °C/h is 4 minutes exactly; 11 °C is 4.4 minutes, so 5
        assertEquals(5, new Segment(150, 31, 0).rampMinutes(20));
    }

    @Test
    public void acceptsTheKilnsOwnLimits() {
        Segment flatOut = new Segment(Segment.MAX_RATE_PER_HOUR, Segment.MAX_CELSIUS, 0);

        assertEquals(Segment.MAX_CELSIUS, flatOut.targetCelsius());
    }

    @Test
    public void rejectsARateOfZero() {
        assertThrows(IllegalArgumentException.class, () -> new Segment(0, 900, 0));
    }

    @Test
    public void rejectsARateTheElementsCannotReach() {
        assertThrows(IllegalArgumentException.class, () -> new Segment(900, 900, 0));
    }

    @Test
    public void rejectsATargetAboveTheKilnRating() {
        assertThrows(IllegalArgumentException.class, () -> new Segment(100, 1400, 0));
    }

    @Test
    public void rejectsATargetBelowFreezing() {
        assertThrows(IllegalArgumentException.class, () -> new Segment(100, -10, 0));
    }

    @Test
    public void rejectsANegativeHold() {
        assertThrows(IllegalArgumentException.class, () -> new Segment(100, 900, -5));
    }
}
