package dev.changeling.samples.greenhouse;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Map;
import java.util.logging.Logger;

/**
 * Decides, once per round, which zones get water: it holds every valve shut when frost threatens, waters
 * dry zones, puts off what can wait until the cheap night hours, and stops at the day's budget.
 */
public final class IrrigationController {

    /** Below this air temperature wet soil may freeze around the roots, so nothing is watered. */
    public static final double FROST_GUARD_CELSIUS = 2.0;

    /** What the sensors of one zone say. */
    public record Reading(String zone, int moisturePercent, double airCelsius) {
    }

    /** One valve to open, for how long, and what it costs. */
    public record Watering(String zone, int seconds, long costCents) {
    }

    /** The outcome of one round. */
    public record Round(List<Watering> waterings, long costCents, boolean frostHold) {

        public boolean waters(String zone) {
            return waterings.stream().anyMatch(watering -> watering.zone().equals(zone));
        }
    }

    private static final Logger DIAGNOSTICS = Logger.getLogger(IrrigationController.class.getName());

    private final List<Zone> zones;
    private final WaterTariff tariff;
    private final ValveLog log;
    private final long budgetCents;

    public IrrigationController(List<Zone> zones, WaterTariff tariff, ValveLog log, long budgetCents) {
        this.zones = List.copyOf(zones);
        this.tariff = tariff;
        this.log = log;
        this.budgetCents = budgetCents;
    }

    public Round run(Map<String, Reading> readings, int hour) {
        if (frostRisk(readings.values())) {
            for (Zone zone : zones) {
                log.heldShut(zone.name(), "frost guard");
            }
            return new Round(List.of(), 0, true);
        }
        boolean peak = WaterTariff.bandAt(hour) == WaterTariff.Band.PEAK;
        List<Watering> waterings = new ArrayList<>();
        long spent = 0;
        for (Zone zone : zones) {
            Reading reading = readings.get(zone.name());
            if (reading == null) {
                log.skipped(zone.name(), "no reading");
                continue;
            }
            int moisture = reading.moisturePercent();
            if (!zone.needsWater(moisture)) {
                continue;
            }
            if (peak && !zone.seedlings() && !zone.critical(moisture)) {
                log.skipped(zone.name(), "waits for off-peak water");
                continue;
            }
            int seconds = zone.wateringSeconds(moisture);
            long cost = tariff.costInCents(hour, seconds);
            if (spent + cost > budgetCents && !zone.seedlings()) {
                log.skipped(zone.name(), "over budget");
                continue;
            }
            log.opened(zone.name(), seconds);
            waterings.add(new Watering(zone.name(), seconds, cost));
            spent += cost;
        }
        DIAGNOSTICS.fine("round at " + hour + ":00 spent " + spent + " of " + budgetCents + " cents");
        return new Round(List.copyOf(waterings), spent, false);
    }

    static boolean frostRisk(Collection<Reading> readings) {
        for (Reading reading : readings) {
            if (reading.airCelsius() < FROST_GUARD_CELSIUS) {
                return true;
            }
        }
        return false;
    }
}
