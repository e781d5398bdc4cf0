package dev.changeling.samples.kiln;

import java.util.ArrayList;
import java.util.List;

/** A kiln program: segments run one after the other from room temperature. */
public final class FiringSchedule {

    /**
     * Around the quartz inversion (573 °C, from memory) clay bodies crack if heated fast, so fast ramps
     * that start below this are flagged.
     */
    static final int CAREFUL_BELOW_CELSIUS = 600;

    /** Fastest ramp considered safe below {@link #CAREFUL_BELOW_CELSIUS}; common practice, no source. */
    static final int CAREFUL_RATE_PER_HOUR = 150;

    private final int roomCelsius;
    private final List<Segment> segments = new ArrayList<>();

    public FiringSchedule(int roomCelsius) {
        this.roomCelsius = roomCelsius;
    }

    public FiringSchedule then(Segment segment) {
        segments.add(segment);
        return this;
    }

    public int totalMinutes() {
        int minutes = 0;
        int current = roomCelsius;
        for (Segment segment : segments) {
            minutes += segment.rampMinutes(current) + segment.holdMinutes();
            current = segment.targetCelsius();
        }
        return minutes;
    }

    public int peakCelsius() {
        int peak = roomCelsius;
        for (Segment segment : segments) {
            if (segment.targetCelsius() > peak) {
                peak = segment.targetCelsius();
            }
        }
        return peak;
    }

    /** The programmed temperature {@code minute} minutes after start; after the last segment, its target. */
    public double temperatureAt(int minute) {
        if (minute <= 0) {
            return roomCelsius;
        }
        int elapsed = 0;
        int current = roomCelsius;
        for (Segment segment : segments) {
            int ramp = segment.rampMinutes(current);
            if (minute < elapsed + ramp) {
                double fraction = (double) (minute - elapsed) / ramp;
                return current + (segment.targetCelsius() - current) * fraction;
            }
            elapsed += ramp;
            if (minute < elapsed + segment.holdMinutes()) {
                return segment.targetCelsius();
            }
            elapsed += segment.holdMinutes();
            current = segment.targetCelsius();
        }
        return current;
    }

    /** Steps that risk the ware, one line each, in program order. */
    public List<String> warnings() {
        List<String> warnings = new ArrayList<>();
        int current = roomCelsius;
        for (int index = 0; index < segments.size(); index++) {
            Segment segment = segments.get(index);
            boolean heating = segment.targetCelsius() > current;
            if (heating && current < CAREFUL_BELOW_CELSIUS && segment.ratePerHour() > CAREFUL_RATE_PER_HOUR) {
                warnings.add("segment " + (index + 1) + ": " + segment.ratePerHour()
                        + " °C/h from " + current + " °C may crack the clay");
            }
            current = segment.targetCelsius();
        }
        return warnings;
    }
}
