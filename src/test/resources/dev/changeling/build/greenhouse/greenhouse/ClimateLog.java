package greenhouse;

import java.util.ArrayList;
import java.util.List;

/** Hourly temperature and humidity readings, with the summaries the grower looks at each morning. */
public final class ClimateLog {

    private final List<int[]> readings = new ArrayList<>();
    private int alarms;
    private final int maxTenths;

    /** @param maxTenths the temperature, in tenths of a degree, above which a reading raises an alarm */
    public ClimateLog(int maxTenths) {
        this.maxTenths = maxTenths;
    }

    public void record(int hour, int tenths, int humidity) {
        if (hour < 0 || hour > 23) {
            throw new IllegalArgumentException("hour " + hour + " is not within 0..23");
        }
        readings.add(new int[] {hour, tenths, humidity});
        if (tenths > maxTenths) {
            alarms++;
        }
    }

    public int alarms() {
        return alarms;
    }

    /** The mean temperature in tenths, rounded half away from zero. */
    public int meanTenths() {
        if (readings.isEmpty()) {
            return 0;
        }
        long sum = 0;
        for (int[] reading : readings) {
            sum += reading[1];
        }
        long n = readings.size();
        return (int) (sum >= 0 ? (sum + n / 2) / n : (sum - n / 2) / n);
    }

    /** The widest swing between two consecutive readings. */
    public int widestSwing() {
        int widest = 0;
        for (int i = 1; i < readings.size(); i++) {
            int swing = Math.abs(readings.get(i)[1] - readings.get(i - 1)[1]);
            if (swing > widest) {
                widest = swing;
            }
        }
        return widest;
    }

    /** How many hours in a row the humidity stayed at or above {@code level}, at most. */
    public int longestHumidStretch(int level) {
        int longest = 0;
        int current = 0;
        for (int[] reading : readings) {
            if (reading[2] >= level) {
                current++;
                longest = Math.max(longest, current);
            } else {
                current = 0;
            }
        }
        return longest;
    }

    /** Degree-hours above a base temperature, the growers' measure of warmth. */
    public int degreeHours(int baseTenths) {
        int total = 0;
        for (int[] reading : readings) {
            int above = reading[1] - baseTenths;
            total += above > 0 ? above : 0;
        }
        return total / 10;
    }

    /** {@code 21.4 °C}, with a minus sign for frost. */
    public static String format(int tenths) {
        int whole = Math.abs(tenths) / 10;
        int fraction = Math.abs(tenths) % 10;
        return (tenths < 0 ? "-" : "") + whole + "." + fraction + " °C";
    }

    /** Whether the night (hours 22 to 5) stayed above frost and under the alarm level. */
    public boolean calmNight() {
        for (int[] reading : readings) {
            boolean night = reading[0] >= 22 || reading[0] <= 5;
            if (night && (reading[1] <= 0 || reading[1] > maxTenths)) {
                return false;
            }
        }
        return true;
    }

    public String summary() {
        String text = "mean " + format(meanTenths()) + ", swing " + format(widestSwing());
        if (alarms > 0) {
            text += ", " + alarms + (alarms == 1 ? " alarm" : " alarms");
        }
        return text;
    }
}
