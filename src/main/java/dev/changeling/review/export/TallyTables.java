package dev.changeling.review.export;

import dev.changeling.analysis.Score;
import dev.changeling.analysis.Tally;
import dev.changeling.results.Verdict;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;

/** The HTML report's figures per file and per mutation operator: counts, the score, and a small bar of it. */
final class TallyTables {

    private TallyTables() {
    }

    static String render(Score score) {
        Map<String, Tally> byOperator = new LinkedHashMap<>();
        score.byOperator().forEach((key, tally) ->
                byOperator.put(key.operator() + (key.order() > 1 ? " (order " + key.order() + ")" : ""), tally));
        return "<section id=\"figures\">\n<h2>By file and by operator</h2>\n"
                + table("file", score.byFile()) + table("mutation operator", byOperator) + "</section>\n";
    }

    private static String table(String what, Map<String, Tally> rows) {
        StringBuilder out = new StringBuilder("<table class=\"tally\">\n<thead><tr>")
                .append(HtmlText.element("th", what))
                .append("<th>mutants</th><th>detected</th><th>survived</th><th>unreached</th><th>not counted</th>"
                        + "<th>score</th><th></th></tr></thead>\n<tbody>\n");
        rows.forEach((name, tally) -> out.append("<tr><td class=\"name\">").append(HtmlText.path(name)).append("</td>")
                .append(number(tally.all())).append(number(tally.detected())).append(number(tally.count(Verdict.SURVIVED)))
                .append(number(tally.count(Verdict.UNREACHED)))
                .append(number(tally.count(Verdict.STILLBORN) + tally.count(Verdict.SKIPPED) + tally.equivalent()))
                .append("<td class=\"num\">").append(tally.score().isPresent() ? Summary.down(tally.score().getAsDouble()) : "—")
                .append("</td><td>").append(scoreBar(tally)).append("</td></tr>\n"));
        return out.append("</tbody>\n</table>\n").toString();
    }

    private static String number(int value) {
        return "<td class=\"num\">" + value + "</td>";
    }

    private static String scoreBar(Tally tally) {
        double share = tally.score().orElse(0);
        return String.format(Locale.ROOT, "<svg class=\"score-bar\" viewBox=\"0 0 100 10\" preserveAspectRatio=\"none\">"
                + "<rect width=\"100\" height=\"10\" fill=\"%s\"/><rect width=\"%.1f\" height=\"10\" fill=\"%s\"/></svg>",
                tally.denominator() == 0 ? "#e4e4e4" : VerdictColours.of(Verdict.SURVIVED), 100 * share,
                VerdictColours.of(Verdict.KILLED));
    }
}
