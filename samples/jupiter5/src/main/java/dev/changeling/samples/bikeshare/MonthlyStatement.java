package dev.changeling.samples.bikeshare;

import java.util.ArrayList;
import java.util.List;

/** Adds up a rider's month and gives frequent riders a discount. */
public final class MonthlyStatement {

    /** From this many rides in a month on, every ride is cheaper. */
    static final int LOYAL_RIDES = 10;

    /** The loyalty discount, in per cent. */
    static final int LOYAL_DISCOUNT_PERCENT = 10;

    private final RentalTariff tariff;
    private final List<Ride> rides = new ArrayList<>();

    public MonthlyStatement(RentalTariff tariff) {
        this.tariff = tariff;
    }

    public void add(Ride ride) {
        rides.add(ride);
    }

    public int rideCount() {
        return rides.size();
    }

    public int totalCents() {
        int total = 0;
        for (Ride ride : rides) {
            total += tariff.price(ride);
        }
        if (rides.size() >= LOYAL_RIDES) {
            total = total * (100 - LOYAL_DISCOUNT_PERCENT) / 100;
        }
        return total;
    }

    /** Rides left in the street, which the operator has to fetch. */
    public int streetParkings() {
        int count = 0;
        for (Ride ride : rides) {
            if (!ride.docked()) {
                count++;
            }
        }
        return count;
    }
}
