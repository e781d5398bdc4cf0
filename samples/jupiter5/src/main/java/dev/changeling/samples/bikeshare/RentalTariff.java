package dev.changeling.samples.bikeshare;

/** What a ride costs, in cents: an unlock fee, a price per started quarter hour, a daily cap, a parking fine. */
public final class RentalTariff {

    static final int UNLOCK_CENTS = 100;
    static final int BLOCK_MINUTES = 15;
    static final int PEDAL_CENTS_PER_BLOCK = 50;
    static final int ELECTRIC_CENTS_PER_BLOCK = 120;
    static final int MEMBER_FREE_MINUTES = 30;
    static final int DAILY_CAP_CENTS = 1_500;
    static final int STREET_PARKING_FINE_CENTS = 200;

    private final boolean member;

    public RentalTariff(boolean member) {
        this.member = member;
    }

    public int price(Ride ride) {
        int charged = member ? Math.max(0, ride.minutes() - MEMBER_FREE_MINUTES) : ride.minutes();
        int blocks = (charged + BLOCK_MINUTES - 1) / BLOCK_MINUTES;
        int perBlock = ride.electric() ? ELECTRIC_CENTS_PER_BLOCK : PEDAL_CENTS_PER_BLOCK;
        int cents = blocks * perBlock;
        if (!member) {
            cents += UNLOCK_CENTS;
        }
        cents = Math.min(cents, DAILY_CAP_CENTS);
        if (!ride.docked()) {
            cents += STREET_PARKING_FINE_CENTS;
        }
        return cents;
    }
}
