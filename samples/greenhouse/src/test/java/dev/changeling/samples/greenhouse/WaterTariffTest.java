package dev.changeling.samples.greenhouse;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.changeling.samples.greenhouse.WaterTariff.Band;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class WaterTariffTest {

    private final WaterTariff tariff = new WaterTariff(12);

    @ParameterizedTest(name = "{0}:00 is {1}")
    @CsvSource({
            "0, NIGHT",
            "6, NIGHT",
            "7, DAY",
            "16, DAY",
            "17, PEAK",
            "20, PEAK",
            "23, NIGHT"})
    void hoursFallIntoBands(int hour, Band band) {
        assertEquals(band, WaterTariff.bandAt(hour));
    }

    @ParameterizedTest
    @ValueSource(ints = {-1, 24})
    void rejectsHoursOutsideTheDay(int hour) {
        assertThrows(IllegalArgumentException.class, () -> WaterTariff.bandAt(hour));
    }

    @Test
    void aMinuteAtNightCostsFourCents() {
        // 12 l at 0.30 ct/l = 3.60 ct of water; 45 kJ of pumping at 18 ct/kWh = 0.225 ct; rounded up: 4 ct
        assertEquals(4, tariff.costInCents(2, 60));
    }

    @Test
    void aMinuteAtPeakCostsFiveCents() {
        // 3.60 ct of water; 45 kJ at 47 ct/kWh = 0.5875 ct; 4.1875 ct rounded up: 5 ct
        assertEquals(5, tariff.costInCents(18, 60));
    }

    @Test
    void aShutValveCostsNothing() {
        assertEquals(0, tariff.costInCents(18, 0));
    }

    @Test
    void rejectsAValveThatLetsNothingThrough() {
        assertThrows(IllegalArgumentException.class, () -> new WaterTariff(0));
    }
}
