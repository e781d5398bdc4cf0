package dev.changeling.review.export;

/**
 * Puts arbitrary text into HTML so that it reads back as the same text: source code, test names and paths can
 * hold any character, and none of it may become markup, in element content or in a quoted attribute.
 */
final class HtmlText {

    private HtmlText() {
    }

    /** The text with {@code & < > " '} written as character references. */
    static String escape(String text) {
        if (text == null) {
            return "";
        }
        StringBuilder out = new StringBuilder(text.length() + 16);
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            switch (c) {
                case '&' -> out.append("&amp;");
                case '<' -> out.append("&lt;");
                case '>' -> out.append("&gt;");
                case '"' -> out.append("&quot;");
                case '\'' -> out.append("&#39;");
                default -> out.append(c);
            }
        }
        return out.toString();
    }

    /** An element holding escaped text: {@code element("td", "a<b")} is {@code <td>a&lt;b</td>}. */
    static String element(String name, String text) {
        return "<" + name + ">" + escape(text) + "</" + name + ">";
    }

    /** An element with a class attribute holding escaped text. */
    static String element(String name, String cssClass, String text) {
        return "<" + name + " class=\"" + cssClass + "\">" + escape(text) + "</" + name + ">";
    }

    /** A path as escaped text that may break after each slash, so a long path wraps between folders. */
    static String path(String path) {
        return escape(path).replace("/", "/<wbr>");
    }
}
