package dev.changeling.review.export;

import dev.changeling.review.KillGrid;
import dev.changeling.review.LineMarks;
import dev.changeling.review.SameClasses;
import dev.changeling.review.Standing;
import dev.changeling.review.TestNames;
import java.util.Optional;

/**
 * The run as one self-contained HTML page for people who would rather look than read: the score and its verdicts,
 * figures per file and operator, a strip per file of where the survivors are, the kill matrix as a heat map of tests
 * by operators, and every survivor with its diff. No script, no fetched font, style sheet or image: the pictures are
 * inline SVG, and every piece of source or test text is escaped.
 */
public final class HtmlReport {

    private HtmlReport() {
    }

    /** The page for a run as it stands. */
    public static String render(Standing standing) {
        return render(standing, Optional.empty());
    }

    /**
     * The page, with a further section of figures computed elsewhere placed after the survivors, set apart from the
     * run's own figures.
     */
    public static String render(Standing standing, Optional<HtmlSection> further) {
        TestNames names = new TestNames(standing.results().tests());
        StringBuilder body = new StringBuilder()
                .append("<header>\n<h1>Changeling: mutation report</h1>\n")
                .append(HtmlText.element("p", "summary", Summary.line(standing))).append('\n')
                .append(unread(standing)).append("</header>\n<main>\n")
                .append(ScorePanel.render(standing))
                .append(TallyTables.render(standing.score()))
                .append(LineStripSvg.render(LineMarks.of(standing)))
                .append(KillHeatMap.render(KillGrid.of(standing.results(), KillHeatMap.TOP_TESTS), names))
                .append(SurvivorCards.render(standing, SameClasses.of(standing.results()), names))
                .append(further.map(HtmlReport::furtherFigures).orElse(""))
                .append("</main>\n");
        return HtmlPage.wrap("Changeling mutation report", body.toString());
    }

    private static String unread(Standing standing) {
        if (standing.unreadFiles().isEmpty()) {
            return "";
        }
        StringBuilder out = new StringBuilder(HtmlText.element("p", "warning", standing.unreadSummary() + ":")).append("\n<ul>");
        standing.unreadFiles().forEach(problem -> out.append(HtmlText.element("li", problem)));
        return out.append("</ul>\n").toString();
    }

    private static String furtherFigures(HtmlSection section) {
        return "<section id=\"further\" class=\"further\">\n" + HtmlText.element("h2", section.heading()) + "\n"
                + section.body() + "</section>\n";
    }
}
