package dev.changeling.source;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * A file's text with its Unicode escapes ({@code \u002B}) decoded the way javac reads them before anything else,
 * and the way back from offsets of the decoded text to offsets of the text as written.
 */
public final class UnicodeEscapes {

    private final String decoded;
    /** For each decoded character, where it begins in the written text; one more entry for the end. */
    private final int[] writtenOffsets;
    private final List<Span> escapes;

    private UnicodeEscapes(String decoded, int[] writtenOffsets, List<Span> escapes) {
        this.decoded = decoded;
        this.writtenOffsets = writtenOffsets;
        this.escapes = List.copyOf(escapes);
    }

    /**
     * Decodes every well-formed escape: a backslash that follows an even number of backslashes, one or more
     * {@code u}, four hexadecimal digits. A malformed one is left as written, for the parser to report.
     */
    public static UnicodeEscapes of(String text) {
        StringBuilder decoded = new StringBuilder(text.length());
        int[] offsets = new int[text.length() + 1];
        List<Span> escapes = new ArrayList<>();
        int backslashesBefore = 0;
        int at = 0;
        while (at < text.length()) {
            int end = text.charAt(at) == '\\' && backslashesBefore % 2 == 0 ? escapeEnd(text, at) : -1;
            offsets[decoded.length()] = at;
            if (end < 0) {
                backslashesBefore = text.charAt(at) == '\\' ? backslashesBefore + 1 : 0;
                decoded.append(text.charAt(at));
                at++;
                continue;
            }
            // The character an escape stands for never starts another escape, not even a backslash.
            decoded.append((char) Integer.parseInt(text.substring(end - 4, end), 16));
            escapes.add(new Span(at, end));
            backslashesBefore = 0;
            at = end;
        }
        offsets[decoded.length()] = text.length();
        return new UnicodeEscapes(decoded.toString(), Arrays.copyOf(offsets, decoded.length() + 1), escapes);
    }

    /** The end of the escape that begins at {@code backslash}, or -1 when none does. */
    private static int escapeEnd(String text, int backslash) {
        int at = backslash + 1;
        if (at >= text.length() || text.charAt(at) != 'u') {
            return -1;
        }
        while (at < text.length() && text.charAt(at) == 'u') {
            at++;
        }
        if (at + 4 > text.length()) {
            return -1;
        }
        for (int digit = at; digit < at + 4; digit++) {
            if (Character.digit(text.charAt(digit), 16) < 0) {
                return -1;
            }
        }
        return at + 4;
    }

    public boolean any() {
        return !escapes.isEmpty();
    }

    public String decoded() {
        return decoded;
    }

    /** Where each escape stands in the written text. */
    public List<Span> spans() {
        return escapes;
    }

    /** Where a decoded character (or the decoded text's end) begins in the written text. */
    public int written(int decodedOffset) {
        return writtenOffsets[decodedOffset];
    }

    /** The written text's span of a span of the decoded text: an escape is covered whole or not at all. */
    public Span written(Span decodedSpan) {
        return new Span(writtenOffsets[decodedSpan.begin()], writtenOffsets[decodedSpan.end()]);
    }
}
