package dev.changeling.samples.kiln;

import static org.junit.Assert.assertEquals;
import static org.junit.Assert.assertTrue;

import java.util.List;
import org.junit.Test;

public class FiringScheduleTest {

    private static final double EXACT = 0.0;

    /** A bisque firing: slow through the water smoking, faster to 950 °C, a short soak. */
    private static FiringSchedule bisque() {
        return new FiringSchedule(20)
                .then(new Segment(60, 200, 60))
                .then(new Segment(150, 950, 15));
    }

    @Test
    public void addsRampsAndHolds() {
        // 180 °C at 60 °C/h = 180 min, hold 60; 750 °C at 150 °C/h = 300 min, hold 15
        assertEquals(180 + 60 + 300 + 15, bisque().totalMinutes());
    }

    @Test
    public void peakIsTheHottestTarget() {
        assertEquals(950, bisque().peakCelsius());
    }

    @Test
    public void startsAtRoomTemperature() {
        assertEquals(20.0, bisque().temperatureAt(0), EXACT);
    }

    @Test
    public void isHalfwayUpHalfwayThroughTheFirstRamp() {
        assertEquals(110.0, bisque().temperatureAt(90), EXACT);
    }

    @Test
    public void climbsTheSecondRampFromTheFirstTarget() {
        // the second ramp starts at minute 240 at 200 °C and gains 2.5 °C a minute
        assertEquals(450.0, bisque().temperatureAt(340), EXACT);
    }

    @Test
    public void holdsTheTargetDuringTheSoak() {
        // the first ramp ends at minute 180; the soak at 200 °C lasts until minute 240
        assertEquals(200.0, bisque().temperatureAt(200), EXACT);
    }

    @Test
    public void staysAtTheLastTargetAfterTheProgramEnds() {
        assertEquals(950.0, bisque().temperatureAt(10_000), EXACT);
    }

    @Test
    public void aCarefulScheduleHasNoWarnings() {
        assertEquals(List.of(), bisque().warnings());
    }

    @Test
    public void warnsAboutAFastRampFromCold() {
        FiringSchedule rushed = new FiringSchedule(20).then(new Segment(300, 950, 0));

        assertTrue(rushed.warnings().get(0).startsWith("segment 1:"));
    }

    @Test
    public void aFastRampThatStartsHotIsFine() {
        FiringSchedule glaze = new FiringSchedule(20)
                .then(new Segment(100, 1000, 0))
                .then(new Segment(500, 1240, 10));

        assertEquals(List.of(), glaze.warnings());
    }

    /** A bisque, then a fast cool in two steps: cooling fast is not what cracks the clay on the way up. */
    private static FiringSchedule crashCooled() {
        return new FiringSchedule(20)
                .then(new Segment(100, 950, 0))
                .then(new Segment(300, 500, 0))
                .then(new Segment(300, 300, 0));
    }

    @Test
    public void fastCoolingIsNoWarning() {
        assertEquals(List.of(), crashCooled().warnings());
    }

    @Test
    public void peakIsNotLoweredByCooling() {
        assertEquals(950, crashCooled().peakCelsius());
    }
}
