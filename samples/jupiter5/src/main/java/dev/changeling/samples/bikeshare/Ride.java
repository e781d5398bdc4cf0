package dev.changeling.samples.bikeshare;

/**
 * One rental, from unlocking a bike to locking it again.
 *
 * @param minutes  how long the bike was out, rounded up to whole minutes by the lock
 * @param electric an e-bike rather than a pedal bike
 * @param docked   locked at a dock rather than left in the street
 */
public record Ride(int minutes, boolean electric, boolean docked) {

    public Ride {
        if (minutes < 1) {
            throw new IllegalArgumentException("a ride lasts at least one minute, not " + minutes);
        }
    }
}
