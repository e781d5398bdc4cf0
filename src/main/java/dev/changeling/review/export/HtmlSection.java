package dev.changeling.review.export;

import java.util.List;

/**
 * A further part of the HTML report that figures computed elsewhere fill in (such as coverage beside the score,
 * redundant tests, coupling): a heading and a table or a paragraph, every piece of text escaped when it is made.
 */
public final class HtmlSection {

    private final String heading;
    private final String body;

    private HtmlSection(String heading, String body) {
        this.heading = heading;
        this.body = body;
    }

    /** A table under a heading, a sentence before it; every cell is text. */
    public static HtmlSection table(String heading, String note, List<String> columns, List<List<String>> rows) {
        StringBuilder body = new StringBuilder();
        if (note != null && !note.isBlank()) {
            body.append(HtmlText.element("p", note)).append('\n');
        }
        body.append("<table class=\"figures\">\n<thead><tr>");
        columns.forEach(column -> body.append(HtmlText.element("th", column)));
        body.append("</tr></thead>\n<tbody>\n");
        for (List<String> row : rows) {
            body.append("<tr>");
            row.forEach(cell -> body.append(HtmlText.element("td", cell)));
            body.append("</tr>\n");
        }
        return new HtmlSection(heading, body.append("</tbody>\n</table>\n").toString());
    }

    /** Paragraphs of text under a heading. */
    public static HtmlSection paragraphs(String heading, List<String> paragraphs) {
        StringBuilder body = new StringBuilder();
        paragraphs.forEach(paragraph -> body.append(HtmlText.element("p", paragraph)).append('\n'));
        return new HtmlSection(heading, body.toString());
    }

    /** Text laid out in lines and columns, as a terminal shows it, under a heading. */
    public static HtmlSection preformatted(String heading, String text) {
        return new HtmlSection(heading, HtmlText.element("pre", text) + "\n");
    }

    String heading() {
        return heading;
    }

    String body() {
        return body;
    }
}
