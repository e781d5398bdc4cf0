package greenhouse;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/** Plans how much water each bed gets over a week, given soil readings and the tank's capacity. */
public final class IrrigationPlan {

    /** One bed's share of the water on one day. */
    public record Share(String bed, int day, int litres) {
    }

    private static final int DAYS = 7;

    private final int tankLitres;
    private final Map<String, Integer> thirst = new TreeMap<>();
    private final List<Share> shares = new ArrayList<>();
    private int reserve;

    public IrrigationPlan(int tankLitres, int reserve) {
        if (tankLitres <= 0) {
            throw new IllegalArgumentException("a tank holds some water, not " + tankLitres + " litres");
        }
        this.tankLitres = tankLitres;
        this.reserve = Math.max(0, reserve);
    }

    /** Records a bed's need: dry soil and wide beds drink more. */
    public IrrigationPlan bed(String name, int moisturePercent, int widthMetres) {
        int dryness = 100 - Math.min(100, Math.max(0, moisturePercent));
        int need = dryness * widthMetres / 10 + (widthMetres > 3 ? 2 : 0);
        thirst.merge(name, need, Integer::sum);
        return this;
    }

    public int totalNeed() {
        int total = 0;
        for (int need : thirst.values()) {
            total += need;
        }
        return total;
    }

    /** Spreads the tank over the week, in proportion to need, keeping the reserve back. */
    public List<Share> spread() {
        shares.clear();
        int available = tankLitres - reserve;
        int need = totalNeed();
        if (available <= 0 || need == 0) {
            return List.of();
        }
        for (int day = 0; day < DAYS; day++) {
            int today = available / DAYS + (day < available % DAYS ? 1 : 0);
            int given = 0;
            for (Map.Entry<String, Integer> bed : thirst.entrySet()) {
                int litres = (int) ((long) today * bed.getValue() / need);
                if (litres > 0) {
                    shares.add(new Share(bed.getKey(), day, litres));
                    given += litres;
                }
            }
            reserve += today - given;
        }
        return Collections.unmodifiableList(shares);
    }

    /** The litres a bed gets over the whole week. */
    public int weekly(String bed) {
        int sum = 0;
        for (Share share : shares) {
            if (share.bed().equals(bed)) {
                sum += share.litres();
            }
        }
        return sum;
    }

    /** The first day on which a bed gets nothing, or -1 when it is watered every day. */
    public int firstDryDay(String bed) {
        boolean[] watered = new boolean[DAYS];
        for (Share share : shares) {
            if (share.bed().equals(bed) && share.litres() > 0) {
                watered[share.day()] = true;
            }
        }
        int day = 0;
        while (day < DAYS && watered[day]) {
            day++;
        }
        return day == DAYS ? -1 : day;
    }

    public int reserve() {
        return reserve;
    }

    /** A line per day: {@code day 3: fern 12, moss 4}. */
    public String describe() {
        StringBuilder out = new StringBuilder();
        int lastDay = -1;
        for (Share share : shares) {
            if (share.day() != lastDay) {
                if (lastDay >= 0) {
                    out.append('\n');
                }
                out.append("day ").append(share.day() + 1).append(':');
                lastDay = share.day();
            } else {
                out.append(',');
            }
            out.append(' ').append(share.bed()).append(' ').append(share.litres());
        }
        return out.toString();
    }

    /** Whether the plan leaves at least a tenth of the tank in reserve and waters every bed. */
    public boolean safe() {
        boolean everyBed = thirst.keySet().stream().allMatch(bed -> weekly(bed) > 0);
        return everyBed && reserve * 10 >= tankLitres;
    }
}
