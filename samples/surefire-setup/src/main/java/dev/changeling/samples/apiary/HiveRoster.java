package dev.changeling.samples.apiary;

import java.util.ArrayList;
import java.util.List;

/** Reads a yard's list of hives: one {@code name;tareGrams} a line, {@code #} comments and blank lines ignored. */
public final class HiveRoster {

    private HiveRoster() {
    }

    public static List<Hive> parse(String text) {
        List<Hive> hives = new ArrayList<>();
        String[] lines = text.split("\n");
        for (int index = 0; index < lines.length; index++) {
            String line = lines[index].strip();
            if (line.isEmpty() || line.startsWith("#")) {
                continue;
            }
            String[] fields = line.split(";");
            if (fields.length != 2) {
                throw new IllegalArgumentException("line " + (index + 1) + ": expected name;tareGrams, found " + line);
            }
            hives.add(new Hive(fields[0].strip(), Integer.parseInt(fields[1].strip())));
        }
        return hives;
    }
}
