package dev.changeling.samples.greenhouse;

/** Prices a watering: the water itself at a flat rate plus the pump's electricity, which costs more at peak hours. */
public final class WaterTariff {

    /** The electricity supplier's time bands. */
    public enum Band { NIGHT, DAY, PEAK }

    /** Price of one litre of water, in hundredths of a cent. */
    static final int WATER_PRICE_PER_LITRE = 30;

    /** Energy the pump uses per second of watering, in watt-seconds (joules). */
    static final int PUMP_JOULES_PER_SECOND = 750;

    private static final long JOULES_PER_KWH = 3_600_000L;

    private final int litresPerMinute;

    public WaterTariff(int litresPerMinute) {
        if (litresPerMinute <= 0) {
            throw new IllegalArgumentException("a valve must let water through: " + litresPerMinute + " l/min");
        }
        this.litresPerMinute = litresPerMinute;
    }

    public static Band bandAt(int hour) {
        if (hour < 0 || hour > 23) {
            throw new IllegalArgumentException("hour must be 0-23, not " + hour);
        }
        if (hour >= 17 && hour < 21) {
            return Band.PEAK;
        }
        if (hour >= 7 && hour < 17) {
            return Band.DAY;
        }
        return Band.NIGHT;
    }

    /** Electricity price per kilowatt-hour in each band, in hundredths of a cent. */
    static int electricityPricePerKwh(Band band) {
        return switch (band) {
            case NIGHT -> 1_800;
            case DAY -> 2_900;
            case PEAK -> 4_700;
        };
    }

    /** What opening a valve for {@code seconds} at {@code hour} costs, in whole cents, rounded up. */
    public long costInCents(int hour, int seconds) {
        if (seconds == 0) {
            return 0;
        }
        long litres = (long) seconds * litresPerMinute / 60;
        long water = litres * WATER_PRICE_PER_LITRE;
        long energy = (long) seconds * PUMP_JOULES_PER_SECOND * electricityPricePerKwh(bandAt(hour)) / JOULES_PER_KWH;
        long hundredths = water + energy;
        return (hundredths + 99) / 100;
    }
}
