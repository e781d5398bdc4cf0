package dev.changeling.samples.bikeshare;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class MonthlyStatementTest {

    private final MonthlyStatement statement = new MonthlyStatement(new RentalTariff(false));

    @Test
    void addsUpTheRides() {
        statement.add(new Ride(10, false, true));
        statement.add(new Ride(20, true, true));

        assertEquals(150 + 340, statement.totalCents());
        assertEquals(2, statement.rideCount());
    }

    @Test
    void frequentRidersGetTenPercentOff() {
        for (int ride = 0; ride < 12; ride++) {
            statement.add(new Ride(10, false, true));
        }

        assertEquals(12 * 150 * 90 / 100, statement.totalCents());
    }

    @Test
    void countsTheBikesLeftInTheStreet() {
        statement.add(new Ride(10, false, false));
        statement.add(new Ride(10, false, true));

        assertEquals(1, statement.streetParkings());
    }
}
