package dev.changeling.review.export;

import dev.changeling.results.Verdict;
import dev.changeling.review.LineMarks;
import dev.changeling.review.LineMarks.Mark;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The HTML report's strip per file: the file from line 1 to its last mutated line as a bar, a mark at each line
 * with a mutant: tall for a survivor to look at, middling for an unreached mutant, short and faint for a detected one.
 */
final class LineStripSvg {

    private static final int WIDTH = 1000;
    private static final int HEIGHT = 34;
    private static final int AXIS = 24;

    private LineStripSvg() {
    }

    static String render(List<LineMarks> files) {
        StringBuilder out = new StringBuilder("<section id=\"strips\">\n<h2>Where the survivors are</h2>\n")
                .append("<p>Each file from line 1 to its last mutated line. ")
                .append(key(Mark.SURVIVED, "survivor to look at")).append(' ')
                .append(key(Mark.UNREACHED, "unreached: no test runs it")).append(' ')
                .append(key(Mark.DETECTED, "every mutant detected")).append("</p>\n");
        for (LineMarks file : files) {
            out.append("<div class=\"strip\">").append(HtmlText.element("div", "strip-name", file.file()))
                    .append(svg(file)).append(HtmlText.element("div", "strip-lines", file.inWords())).append("</div>\n");
        }
        return out.append("</section>\n").toString();
    }

    private static String key(Mark mark, String words) {
        return "<span class=\"swatch\" style=\"background:" + colour(mark) + "\"></span>" + HtmlText.escape(words) + ".";
    }

    private static String svg(LineMarks file) {
        StringBuilder svg = new StringBuilder(String.format(Locale.ROOT,
                "<svg class=\"strip-bar\" viewBox=\"0 0 %d %d\" role=\"img\" aria-label=\"%s\">"
                        + "<rect x=\"0\" y=\"%d\" width=\"%d\" height=\"4\" fill=\"#dcdcdc\"/>",
                WIDTH, HEIGHT, HtmlText.escape("lines of " + file.file()), AXIS - 2, WIDTH));
        for (Map.Entry<Integer, Mark> line : file.marks().entrySet()) {
            double x = file.lastLine() <= 1 ? WIDTH / 2.0 : (WIDTH - 4) * (line.getKey() - 1.0) / (file.lastLine() - 1) + 2;
            int height = switch (line.getValue()) {
                case SURVIVED -> 22;
                case UNREACHED -> 15;
                case DETECTED -> 7;
            };
            svg.append(String.format(Locale.ROOT,
                    "<rect x=\"%.1f\" y=\"%d\" width=\"3\" height=\"%d\" fill=\"%s\"%s><title>line %d: %s</title></rect>",
                    x - 1.5, AXIS - height, height, colour(line.getValue()),
                    line.getValue() == Mark.DETECTED ? " fill-opacity=\"0.45\"" : "", line.getKey(), line.getValue().words()));
        }
        svg.append(String.format(Locale.ROOT, "<text x=\"0\" y=\"%d\" class=\"axis\">1</text>"
                + "<text x=\"%d\" y=\"%d\" class=\"axis\" text-anchor=\"end\">%d</text></svg>", HEIGHT - 1, WIDTH, HEIGHT - 1,
                file.lastLine()));
        return svg.toString();
    }

    static String colour(Mark mark) {
        return switch (mark) {
            case SURVIVED -> VerdictColours.of(Verdict.SURVIVED);
            case UNREACHED -> VerdictColours.of(Verdict.UNREACHED);
            case DETECTED -> VerdictColours.of(Verdict.KILLED);
        };
    }
}
