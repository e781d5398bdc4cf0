package dev.changeling.samples.greenhouse;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.samples.greenhouse.IrrigationController.Reading;
import dev.changeling.samples.greenhouse.IrrigationController.Round;
import dev.changeling.samples.greenhouse.IrrigationController.Watering;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

class IrrigationControllerTest {

    private static final int NIGHT = 2;
    private static final int PEAK = 18;

    private final Zone tomatoes = new Zone("tomatoes", 40, 60, false);
    private final Zone herbs = new Zone("herbs", 35, 45, false);
    private final Zone lettuce = new Zone("lettuce", 50, 30, true);
    private final ValveLog log = new ValveLog();

    private IrrigationController controller(long budgetCents, Zone... zones) {
        return new IrrigationController(List.of(zones), new WaterTariff(12), log, budgetCents);
    }

    private static Map<String, Reading> readings(Reading... readings) {
        return Stream.of(readings).collect(Collectors.toMap(Reading::zone, reading -> reading));
    }

    @Nested
    class FrostGuard {

        @Test
        void holdsEveryValveShutInAFrost() {
            Round round = controller(100, tomatoes, herbs).run(
                    readings(new Reading("tomatoes", 10, -3.0), new Reading("herbs", 10, 4.0)), NIGHT);

            assertTrue(round.frostHold());
            assertEquals(List.of(), round.waterings());
        }

        @Test
        void watersWhenTheAirIsMild() {
            Round round = controller(100, tomatoes).run(readings(new Reading("tomatoes", 10, 8.0)), NIGHT);

            assertFalse(round.frostHold());
            assertTrue(round.waters("tomatoes"));
        }
    }

    @Nested
    class DryZones {

        @Test
        void watersOnlyTheZonesBelowTheirThreshold() {
            Round round = controller(100, tomatoes, herbs).run(
                    readings(new Reading("tomatoes", 20, 12.0), new Reading("herbs", 50, 12.0)), NIGHT);

            // 60 s + 20 missing points x 4 s = 140 s; 28 l = 8.40 ct of water + 0.525 ct of pumping -> 9 ct
            assertEquals(List.of(new Watering("tomatoes", 140, 9)), round.waterings());
            assertEquals(140, log.secondsOpen("tomatoes"));
        }

        @Test
        void aZoneWithoutAReadingIsLeftAlone() {
            Round round = controller(100, tomatoes, lettuce).run(readings(new Reading("tomatoes", 20, 12.0)), NIGHT);

            assertFalse(round.waters("lettuce"));
            assertTrue(round.waters("tomatoes"));
        }
    }

    @Nested
    class PeakHours {

        @Test
        void aZoneThatCanWaitWaitsForTheNight() {
            Round round = controller(100, tomatoes).run(readings(new Reading("tomatoes", 30, 12.0)), PEAK);

            assertFalse(round.waters("tomatoes"));
        }

        @Test
        void aCriticallyDryZoneIsWateredAnyway() {
            Round round = controller(100, herbs).run(readings(new Reading("herbs", 10, 12.0)), PEAK);

            assertTrue(round.waters("herbs"));
        }
    }

    @Nested
    class Budget {

        @Test
        void stopsWateringWhenTheBudgetIsSpent() {
            Zone beans = new Zone("beans", 40, 60, false);
            Round round = controller(12, tomatoes, beans).run(
                    readings(new Reading("tomatoes", 20, 12.0), new Reading("beans", 30, 12.0)), NIGHT);

            // tomatoes cost 9 ct; beans (100 s, 7 ct) would bring the round to 16 ct
            assertTrue(round.waters("tomatoes"));
            assertFalse(round.waters("beans"));
        }
    }
}
