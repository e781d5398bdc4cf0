package dev.changeling.review.export;

import dev.changeling.review.KillGrid;
import dev.changeling.review.TestNames;
import java.util.Locale;

/**
 * The HTML report's kill matrix in brief: a table of tests (rows, most kills first) by mutation operators (columns),
 * each cell the number of that operator's mutants the test kills, shaded from white to deep blue.
 */
final class KillHeatMap {

    /** How many tests get a row; the rest are counted beneath. */
    static final int TOP_TESTS = 30;

    private KillHeatMap() {
    }

    static String render(KillGrid grid, TestNames names) {
        StringBuilder out = new StringBuilder("<section id=\"heat-map\">\n<h2>Which tests kill which operators</h2>\n");
        if (grid.rows().isEmpty()) {
            return out.append("<p>No test killed a mutant in this run.</p>\n</section>\n").toString();
        }
        out.append("<p>Each cell counts the mutants of one operator that one test kills; darker is more.");
        out.append(grid.lowerBound()
                ? " The run stopped at each mutant's first failing test, so these counts are a lower bound:"
                        + " a test that would also have failed is not counted.</p>\n"
                : " Every reaching test ran against every mutant (the full kill matrix).</p>\n");
        out.append("<table class=\"heat\">\n<thead><tr><th>test</th>");
        grid.operators().forEach(operator -> out.append(HtmlText.element("th", "op", operator)));
        out.append("<th>all</th></tr></thead>\n<tbody>\n");
        int largest = grid.largest();
        for (KillGrid.Row row : grid.rows()) {
            out.append("<tr>").append(HtmlText.element("td", "name", names.of(row.test())));
            row.counts().forEach(count -> out.append(cell(count, largest)));
            out.append("<td class=\"num\">").append(row.total()).append("</td></tr>\n");
        }
        out.append("</tbody>\n</table>\n");
        if (grid.otherTests() > 0) {
            out.append("<p>…and ").append(grid.otherTests()).append(grid.otherTests() == 1 ? " more test" : " more tests")
                    .append(" with ").append(grid.otherKills()).append(grid.otherKills() == 1 ? " kill" : " kills")
                    .append(" between them.</p>\n");
        }
        return out.append("</section>\n").toString();
    }

    /** A cell shaded by its share of the largest count; empty for none. */
    private static String cell(int count, int largest) {
        if (count == 0) {
            return "<td class=\"cell\"></td>";
        }
        double share = (double) count / Math.max(1, largest);
        int lightness = (int) Math.round(92 - 60 * share);
        return String.format(Locale.ROOT, "<td class=\"cell\" style=\"background:hsl(212,65%%,%d%%);color:%s\">%d</td>",
                lightness, lightness < 55 ? "#fff" : "#102030", count);
    }
}
