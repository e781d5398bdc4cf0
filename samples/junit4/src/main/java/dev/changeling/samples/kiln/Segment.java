package dev.changeling.samples.kiln;

/**
 * One step of a firing: ramp to a target temperature at a steady rate, then hold there.
 *
 * @param ratePerHour   how fast the kiln heats or cools, in °C per hour
 * @param targetCelsius the temperature this step ends at
 * @param holdMinutes   how long the kiln soaks at the target before the next step
 */
public record Segment(int ratePerHour, int targetCelsius, int holdMinutes) {

    /** The elements of this kiln cannot change temperature faster than this. */
    public static final int MAX_RATE_PER_HOUR = 600;

    /** The kiln's rated maximum. */
    public static final int MAX_CELSIUS = 1300;

    public Segment {
        if (ratePerHour <= 0 || ratePerHour > MAX_RATE_PER_HOUR) {
            throw new IllegalArgumentException("rate must be 1-" + MAX_RATE_PER_HOUR + " °C/h, not " + ratePerHour);
        }
        if (targetCelsius < 0 || targetCelsius > MAX_CELSIUS) {
            throw new IllegalArgumentException("target must be 0-" + MAX_CELSIUS + " °C, not " + targetCelsius);
        }
        if (holdMinutes < 0) {
            throw new IllegalArgumentException("hold cannot be negative: " + holdMinutes + " min");
        }
    }

    /** Whole minutes to get from {@code fromCelsius} to the target, rounded up; cooling takes time too. */
    public int rampMinutes(int fromCelsius) {
        int distance = Math.abs(targetCelsius - fromCelsius);
        return (distance * 60 + ratePerHour - 1) / ratePerHour;
    }
}
