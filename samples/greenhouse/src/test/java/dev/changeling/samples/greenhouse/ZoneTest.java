package dev.changeling.samples.greenhouse;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.DynamicTest.dynamicTest;

import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;
import org.junit.jupiter.api.function.Executable;

class ZoneTest {

    private final Zone tomatoes = new Zone("tomatoes", 40, 60, false);

    @TestFactory
    Stream<DynamicTest> rejectsZonesThatCannotBeWatered() {
        return Stream.of(
                rejected("blank name", () -> new Zone(" ", 40, 60, false)),
                rejected("negative threshold", () -> new Zone("beans", -1, 60, false)),
                rejected("threshold above 100 %", () -> new Zone("beans", 101, 60, false)),
                rejected("no watering time", () -> new Zone("beans", 40, 0, false)),
                rejected("watering beyond the valve limit", () -> new Zone("beans", 40, 601, false)));
    }

    private static DynamicTest rejected(String name, Executable creation) {
        return dynamicTest(name, () -> assertThrows(IllegalArgumentException.class, creation));
    }

    @Test
    void drySoilNeedsWater() {
        assertTrue(tomatoes.needsWater(25));
    }

    @Test
    void moistSoilNeedsNoWater() {
        assertFalse(tomatoes.needsWater(55));
    }

    @Test
    void eachMissingPercentAddsFourSeconds() {
        assertEquals(60 + 10 * 4, tomatoes.wateringSeconds(30));
    }

    @Test
    void soilAboveTheThresholdGetsTheBaseTime() {
        assertEquals(60, tomatoes.wateringSeconds(70));
    }

    @Test
    void seedlingsGetHalfAsMuch() {
        Zone lettuce = new Zone("lettuce", 40, 60, true);
        assertEquals(50, lettuce.wateringSeconds(30));
    }
}
