package dev.changeling.samples.orchard.stall;

import dev.changeling.samples.orchard.crates.Crate;
import dev.changeling.samples.orchard.crates.Ripeness;

/** What the farm stall asks for a crate: sound apples at the board's price, bruised ones at half, a full crate a tenth off. */
public final class PriceBoard {

    private final int centsPerApple;

    public PriceBoard(int centsPerApple) {
        this.centsPerApple = centsPerApple;
    }

    public int priceInCents(Crate crate) {
        int cents = crate.sound() * centsPerApple + crate.bruised() * centsPerApple / 2;
        if (crate.full()) {
            cents = cents * 9 / 10;
        }
        return cents;
    }

    /** Only ripe rows go on the board. */
    public boolean sells(Ripeness ripeness) {
        return ripeness == Ripeness.READY;
    }
}
