package dev.changeling.samples.bikeshare;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class RentalTariffTest {

    @Nested
    class CasualRider {

        private final RentalTariff tariff = new RentalTariff(false);

        @ParameterizedTest(name = "{0} min, electric={1}: {2} ct")
        @CsvSource({
                "1,  false, 150",
                "15, false, 150",
                "16, false, 200",
                "40, false, 250",
                "10, true,  220",
                "31, true,  460"})
        void paysTheUnlockFeeAndEveryStartedQuarterHour(int minutes, boolean electric, int cents) {
            assertEquals(cents, tariff.price(new Ride(minutes, electric, true)));
        }

        @Test
        void paysAFineForLeavingTheBikeInTheStreet() {
            assertEquals(150 + 200, tariff.price(new Ride(5, false, false)));
        }
    }

    @Nested
    class Member {

        private final RentalTariff tariff = new RentalTariff(true);

        @Test
        void rideInTheFreeHalfHourCostsNothing() {
            assertEquals(0, tariff.price(new Ride(20, true, true)));
        }

        @Test
        void paysOnlyForTheTimeBeyondTheFreeHalfHour() {
            // 50 min: 20 charged minutes = 2 blocks of an e-bike, no unlock fee
            assertEquals(240, tariff.price(new Ride(50, true, true)));
        }
    }

    @Test
    void aRideOfNoTimeIsNotARide() {
        assertThrows(IllegalArgumentException.class, () -> new Ride(0, false, true));
    }
}
