package dev.changeling.review.export;

import dev.changeling.analysis.Interval;
import dev.changeling.analysis.Tally;
import dev.changeling.results.RunResults;
import dev.changeling.results.Verdict;
import dev.changeling.review.Standing;
import java.util.Locale;

/** The HTML report's first part: the mutation score, its 95% interval for a sample, and a bar of the verdicts. */
final class ScorePanel {

    private static final int BAR_WIDTH = 1000;

    private ScorePanel() {
    }

    static String render(Standing standing) {
        RunResults results = standing.results();
        Tally overall = standing.score().overall();
        StringBuilder out = new StringBuilder("<section id=\"score\">\n<h2>Mutation score</h2>\n");
        if (overall.score().isPresent()) {
            out.append("<p class=\"score\"><span class=\"figure\">").append(Summary.down(overall.score().getAsDouble()))
                    .append("</span> ").append(overall.detected()).append(" of ").append(overall.denominator())
                    .append(" counted mutants detected</p>\n");
        } else {
            out.append("<p class=\"score\"><span class=\"figure\">n/a</span> no mutant counts</p>\n");
        }
        if (Summary.sampled(results) && overall.interval95().isPresent()) {
            Interval interval = overall.interval95().get();
            out.append("<p class=\"interval\">95% interval ").append(Summary.down(interval.lower())).append(" to ")
                    .append(Summary.up(interval.upper())).append(" (Wilson score interval): a sample of ")
                    .append(results.mutants().size()).append(" mutants from ").append(results.settings().population())
                    .append("</p>\n");
        }
        out.append(bar(overall)).append(legend(overall));
        if (!results.complete()) {
            out.append("<p class=\"warning\">Partial run: it was interrupted, so these figures are incomplete.</p>\n");
        }
        return out.append("</section>\n").toString();
    }

    /** One horizontal bar, a stretch per verdict in proportion to its count. */
    private static String bar(Tally overall) {
        StringBuilder svg = new StringBuilder("<svg class=\"verdict-bar\" viewBox=\"0 0 " + BAR_WIDTH + " 22\""
                + " preserveAspectRatio=\"none\" role=\"img\" aria-label=\"mutants by verdict\">");
        double x = 0;
        int all = Math.max(1, overall.all());
        for (Verdict verdict : Verdict.values()) {
            int count = overall.count(verdict);
            if (count == 0) {
                continue;
            }
            double width = (double) BAR_WIDTH * count / all;
            svg.append(String.format(Locale.ROOT, "<rect x=\"%.1f\" y=\"0\" width=\"%.1f\" height=\"22\" fill=\"%s\">"
                    + "<title>%s %d</title></rect>", x, width, VerdictColours.of(verdict), verdict.word(), count));
            x += width;
        }
        return svg.append("</svg>\n").toString();
    }

    private static String legend(Tally overall) {
        StringBuilder out = new StringBuilder("<ul class=\"legend\">");
        out.append("<li>").append(overall.all()).append(overall.all() == 1 ? " mutant" : " mutants").append("</li>");
        for (Verdict verdict : Verdict.values()) {
            out.append("<li><span class=\"swatch\" style=\"background:").append(VerdictColours.of(verdict)).append("\"></span>")
                    .append(verdict.word()).append(' ').append(overall.count(verdict)).append("</li>");
        }
        if (overall.equivalent() > 0) {
            out.append("<li>equivalent (listed) ").append(overall.equivalent()).append("</li>");
        }
        return out.append("</ul>\n").toString();
    }
}
