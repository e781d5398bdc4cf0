package dev.changeling.terminal;

import dev.changeling.review.KillGrid;
import dev.changeling.review.TestNames;
import java.util.ArrayList;
import java.util.List;

/**
 * The kill matrix in brief as a small shaded table: a row per test (most kills first), a column per mutation operator
 * (lettered, with a key beneath), each cell shaded by its share of the largest count: {@code ░ ▒ ▓ █}, blank for none.
 */
public final class KillShades {

    /** How many tests get a row on the terminal; the rest are counted. */
    public static final int TOP_TESTS = 8;

    private static final int NAME_WIDTH = 44;
    private static final String SHADES = "░▒▓█";

    private final Style style;

    public KillShades(Style style) {
        this.style = style;
    }

    public List<String> render(KillGrid grid, TestNames names) {
        List<String> lines = new ArrayList<>();
        if (grid.rows().isEmpty()) {
            lines.add("  no test killed a mutant");
            return lines;
        }
        StringBuilder header = new StringBuilder("  " + " ".repeat(NAME_WIDTH) + " ");
        for (int column = 0; column < grid.operators().size(); column++) {
            header.append(letter(column)).append(' ');
        }
        lines.add(style.bold(header.toString().stripTrailing()));
        int largest = grid.largest();
        for (KillGrid.Row row : grid.rows()) {
            StringBuilder line = new StringBuilder("  ").append(fitted(names.of(row.test()))).append(' ');
            row.counts().forEach(count -> line.append(style.cyan(shade(count, largest))).append(' '));
            lines.add(line.append(' ').append(row.total()).toString());
        }
        if (grid.otherTests() > 0) {
            lines.add("  …and " + grid.otherTests() + (grid.otherTests() == 1 ? " more test" : " more tests")
                    + " with " + grid.otherKills() + (grid.otherKills() == 1 ? " kill" : " kills"));
        }
        List<String> key = new ArrayList<>();
        for (int column = 0; column < grid.operators().size(); column++) {
            key.add(letter(column) + " " + grid.operators().get(column));
        }
        lines.add(style.dim("  " + String.join("  ", key)));
        if (grid.lowerBound()) {
            lines.add(style.dim("  (a lower bound: the run stopped at each mutant's first failing test)"));
        }
        return lines;
    }

    /** {@code ░} up to a quarter of the largest count, {@code ▒} to a half, {@code ▓} to three quarters, {@code █} above. */
    static String shade(int count, int largest) {
        if (count == 0) {
            return " ";
        }
        int step = (int) Math.ceil(4.0 * count / Math.max(1, largest)) - 1;
        return String.valueOf(SHADES.charAt(Math.max(0, Math.min(3, step))));
    }

    private static char letter(int column) {
        return column < 26 ? (char) ('A' + column) : (char) ('a' + column - 26);
    }

    private static String fitted(String name) {
        if (name.length() > NAME_WIDTH) {
            return name.substring(0, NAME_WIDTH - 1) + "…";
        }
        return name + " ".repeat(NAME_WIDTH - name.length());
    }
}
