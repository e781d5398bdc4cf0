package dev.changeling.review.export;

/**
 * Puts arbitrary text into CommonMark so that it reads back as the same text: source code, paths
 * and descriptions can hold any character, and none of it may start markup of its own.
 */
final class MarkdownText {

    /**
     * Characters that can open markup mid-line: code, emphasis, links and images, raw HTML and
     * autolinks, entities, and GitHub's strikethrough, tables and math. Our text never starts a
     * line, so block markup ({@code >}, {@code #}, list markers) needs no escape.
     */
    private static final String INLINE_MARKUP = "\\`*_[]<&~|$";

    private MarkdownText() {
    }

    /** Plain text inside a line: markup characters are backslash-escaped, line breaks become spaces. */
    static String text(String plain) {
        StringBuilder out = new StringBuilder(plain.length() + 8);
        for (int i = 0; i < plain.length(); i++) {
            char c = plain.charAt(i);
            if (c == '\r' || c == '\n') {
                out.append(' ');
            } else {
                if (INLINE_MARKUP.indexOf(c) >= 0) {
                    out.append('\\');
                }
                out.append(c);
            }
        }
        return out.toString();
    }

    /**
     * A code span holding {@code code} exactly: its backtick strings are longer than any inside, and
     * a space pads each side when the code starts or ends with a backtick or a space (the parser
     * strips one such pair).
     */
    static String code(String code) {
        String single = code.replace("\r\n", " ").replace('\r', ' ').replace('\n', ' ');
        String ticks = "`".repeat(longestRun(single, '`') + 1);
        boolean pad = !single.isEmpty() && (single.startsWith("`") || single.endsWith("`")
                || single.startsWith(" ") && single.endsWith(" ") && !single.isBlank());
        return pad ? ticks + " " + single + " " + ticks : ticks + single + ticks;
    }

    /**
     * A fenced code block holding {@code content} exactly, line endings normalised to LF: its backtick
     * fence is longer than any backtick run in the content, so no line inside can close it.
     */
    static String fenced(String info, String content) {
        String body = lf(content);
        String fence = "`".repeat(Math.max(3, longestRun(body, '`') + 1));
        StringBuilder out = new StringBuilder(fence).append(info).append('\n').append(body);
        if (!body.isEmpty() && !body.endsWith("\n")) {
            out.append('\n');
        }
        return out.append(fence).append('\n').toString();
    }

    /** The text with CRLF and lone CR line endings turned into LF, as a CommonMark reader sees them. */
    static String lf(String text) {
        return text.replace("\r\n", "\n").replace('\r', '\n');
    }

    static int longestRun(String text, char c) {
        int longest = 0;
        int run = 0;
        for (int i = 0; i < text.length(); i++) {
            run = text.charAt(i) == c ? run + 1 : 0;
            longest = Math.max(longest, run);
        }
        return longest;
    }
}
