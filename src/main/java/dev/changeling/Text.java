package dev.changeling;

import java.nio.file.Path;

/** Two text forms every layer shows: a message's first line, and a path relative to a folder. */
public final class Text {

    private Text() {
    }

    /** The first line of a message, without surrounding blanks; empty for none. */
    public static String firstLine(String message) {
        if (message == null) {
            return "";
        }
        int newline = message.indexOf('\n');
        return (newline < 0 ? message : message.substring(0, newline)).strip();
    }

    /** {@code file} relative to {@code folder}, with forward slashes on every platform. */
    public static String relative(Path folder, Path file) {
        return folder.relativize(file).toString().replace('\\', '/');
    }
}
