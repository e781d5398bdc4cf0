package dev.changeling.samples.orchard.stall;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.samples.orchard.crates.Crate;
import dev.changeling.samples.orchard.crates.Ripeness;
import org.junit.jupiter.api.Test;

class PriceBoardTest {

    private final PriceBoard board = new PriceBoard(30);

    @Test
    void aFullCrateOfSoundApples_isATenthOff() {
        assertEquals(1080, board.priceInCents(new Crate(40, 0)));
    }

    @Test
    void bruisedApplesSellAtHalfPrice() {
        assertEquals(135, board.priceInCents(new Crate(5, 1)));
    }

    @Test
    void onlyReadyRowsAreSold() {
        assertTrue(board.sells(Ripeness.ofScore(6)));
        assertFalse(board.sells(Ripeness.ofScore(7)));
    }
}
