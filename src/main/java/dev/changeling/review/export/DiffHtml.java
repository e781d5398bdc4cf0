package dev.changeling.review.export;

/** A unified diff as a preformatted block: removed lines red, added lines green, hunk headers blue, all text escaped. */
final class DiffHtml {

    private DiffHtml() {
    }

    static String render(String diff) {
        if (diff == null || diff.isEmpty()) {
            return "<p class=\"note\">(no diff stored for this mutant)</p>\n";
        }
        StringBuilder out = new StringBuilder("<pre class=\"diff\">");
        for (String line : MarkdownText.lf(diff).split("\n")) {
            out.append(HtmlText.element("span", kind(line), line)).append('\n');
        }
        return out.append("</pre>\n").toString();
    }

    private static String kind(String line) {
        if (line.startsWith("---") || line.startsWith("+++")) {
            return "head";
        }
        if (line.startsWith("@@")) {
            return "hunk";
        }
        if (line.startsWith("-")) {
            return "del";
        }
        return line.startsWith("+") ? "add" : "same";
    }
}
