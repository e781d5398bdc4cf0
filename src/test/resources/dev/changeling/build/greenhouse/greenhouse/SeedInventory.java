package greenhouse;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** Keeps count of seed packets by variety, with use-by years and the germination rate seen so far. */
public final class SeedInventory {

    /** One variety in stock. */
    public static final class Lot {
        private final String variety;
        private final int useBy;
        private int packets;
        private int sown;
        private int sprouted;

        Lot(String variety, int useBy, int packets) {
            this.variety = variety;
            this.useBy = useBy;
            this.packets = packets;
        }

        public String variety() {
            return variety;
        }

        public int packets() {
            return packets;
        }

        public int useBy() {
            return useBy;
        }

        /** Sprouted seeds per hundred sown, rounded down; -1 before anything was sown. */
        public int germination() {
            if (sown == 0) {
                return -1;
            }
            return sprouted * 100 / sown;
        }
    }

    private final Map<String, Lot> lots = new HashMap<>();
    private int discarded;

    public void receive(String variety, int useBy, int packets) {
        if (packets < 1) {
            throw new IllegalArgumentException(variety + ": receive at least one packet");
        }
        Lot lot = lots.get(variety);
        if (lot == null) {
            lots.put(variety, new Lot(variety, useBy, packets));
        } else {
            lot.packets += packets;
        }
    }

    /** Takes packets out for sowing; false when there are too few. */
    public boolean take(String variety, int packets) {
        Lot lot = lots.get(variety);
        if (lot == null || lot.packets < packets) {
            return false;
        }
        lot.packets -= packets;
        return true;
    }

    public void recordSowing(String variety, int seeds, int sprouted) {
        Lot lot = lots.get(variety);
        if (lot == null) {
            return;
        }
        lot.sown += seeds;
        lot.sprouted += Math.min(seeds, sprouted);
    }

    /** Throws away every lot past its use-by year; the number of packets thrown away. */
    public int discardExpired(int year) {
        int thrown = 0;
        List<String> expired = new ArrayList<>();
        for (Lot lot : lots.values()) {
            if (lot.useBy < year) {
                expired.add(lot.variety);
                thrown += lot.packets;
            }
        }
        for (String variety : expired) {
            lots.remove(variety);
        }
        discarded += thrown;
        return thrown;
    }

    public int discarded() {
        return discarded;
    }

    /** The variety that sprouts best among those sown at least {@code minimum} times. */
    public Optional<String> mostReliable(int minimum) {
        return lots.values().stream()
                .filter(lot -> lot.sown >= minimum)
                .max(Comparator.comparingInt(Lot::germination).thenComparing(Lot::variety, Comparator.reverseOrder()))
                .map(Lot::variety);
    }

    /** Packets to reorder so that each variety has {@code target}, never fewer than a box of five. */
    public Map<String, Integer> reorder(int target) {
        Map<String, Integer> order = new HashMap<>();
        for (Lot lot : lots.values()) {
            int missing = target - lot.packets;
            if (missing > 0) {
                int boxes = (missing + 4) / 5;
                order.put(lot.variety, boxes * 5);
            }
        }
        return order;
    }

    public int total() {
        return lots.values().stream().mapToInt(Lot::packets).sum();
    }

    /** A short label such as {@code basil x3 (2027)}; expired lots are marked. */
    public String label(String variety, int year) {
        Lot lot = lots.get(variety);
        if (lot == null) {
            return variety + " (none)";
        }
        String label = variety + " x" + lot.packets + " (" + lot.useBy + ")";
        return lot.useBy < year ? label + " expired" : label;
    }
}
