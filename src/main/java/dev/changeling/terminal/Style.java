package dev.changeling.terminal;

import org.fusesource.jansi.Ansi;

/**
 * Colours text with Jansi when the output is a terminal, and not at all when it is piped, when
 * {@code NO_COLOR} is set (no-color.org), or when the user asked for plain text.
 */
public final class Style {

    private final boolean colour;

    private Style(boolean colour) {
        this.colour = colour;
    }

    public static Style plain() {
        return new Style(false);
    }

    public static Style coloured() {
        return new Style(true);
    }

    /** Colour for a terminal on standard output, unless {@code NO_COLOR} is set. */
    public static Style forStandardOutput() {
        String noColour = System.getenv("NO_COLOR");
        boolean terminal = System.console() != null;
        return new Style(terminal && (noColour == null || noColour.isEmpty()));
    }

    public boolean isColoured() {
        return colour;
    }

    public String red(String text) {
        return paint(text, Ansi.Color.RED);
    }

    public String green(String text) {
        return paint(text, Ansi.Color.GREEN);
    }

    public String cyan(String text) {
        return paint(text, Ansi.Color.CYAN);
    }

    public String yellow(String text) {
        return paint(text, Ansi.Color.YELLOW);
    }

    public String bold(String text) {
        return colour ? Ansi.ansi().bold().a(text).reset().toString() : text;
    }

    public String dim(String text) {
        return colour ? Ansi.ansi().a(Ansi.Attribute.INTENSITY_FAINT).a(text).reset().toString() : text;
    }

    private String paint(String text, Ansi.Color color) {
        return colour ? Ansi.ansi().fg(color).a(text).reset().toString() : text;
    }
}
