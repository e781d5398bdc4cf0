package dev.changeling.samples.greenhouse;

import java.util.ArrayList;
import java.util.List;

/** The record of what the controller did to each valve and why, kept for the grower to read in the morning. */
public final class ValveLog {

    /** One line of the log. */
    public record Entry(String zone, Action action, int seconds, String reason) {
    }

    /** What happened to a valve. */
    public enum Action { OPENED, HELD_SHUT, SKIPPED }

    private final List<Entry> entries = new ArrayList<>();

    public void opened(String zone, int seconds) {
        entries.add(new Entry(zone, Action.OPENED, seconds, "dry"));
    }

    public void heldShut(String zone, String reason) {
        entries.add(new Entry(zone, Action.HELD_SHUT, 0, reason));
    }

    public void skipped(String zone, String reason) {
        entries.add(new Entry(zone, Action.SKIPPED, 0, reason));
    }

    public List<Entry> entries() {
        return List.copyOf(entries);
    }

    public int secondsOpen(String zone) {
        int total = 0;
        for (Entry entry : entries) {
            if (entry.action() == Action.OPENED && entry.zone().equals(zone)) {
                total += entry.seconds();
            }
        }
        return total;
    }
}
