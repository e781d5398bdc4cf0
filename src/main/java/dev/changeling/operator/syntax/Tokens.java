package dev.changeling.operator.syntax;

import dev.changeling.source.Span;
import java.util.Set;

/** Keeps a replacement from fusing with its neighbours into other tokens ({@code a+-b} with {@code -} for {@code +}). */
public final class Tokens {

    private static final Set<String> TWO_CHARACTER_STARTS = Set.of(
            "++", "--", "&&", "||", "==", "!=", "<=", ">=", "<<", ">>", "+=", "-=", "*=", "/=", "%=",
            "&=", "|=", "^=", "->", "::", "//", "/*", "*/");

    private Tokens() {
    }

    /** {@code replacement}, with a blank added on a side where it would otherwise run into the text beside {@code edit}. */
    public static String spliced(String text, Span edit, String replacement) {
        char before = edit.begin() > 0 ? text.charAt(edit.begin() - 1) : ' ';
        char after = edit.end() < text.length() ? text.charAt(edit.end()) : ' ';
        if (replacement.isEmpty()) {
            return fuse(before, after) ? " " : "";
        }
        String out = fuse(before, replacement.charAt(0)) ? " " + replacement : replacement;
        return fuse(replacement.charAt(replacement.length() - 1), after) ? out + " " : out;
    }

    private static boolean fuse(char left, char right) {
        boolean words = Character.isJavaIdentifierPart(left) && Character.isJavaIdentifierPart(right)
                && !Character.isIdentifierIgnorable(left) && !Character.isIdentifierIgnorable(right);
        return words || TWO_CHARACTER_STARTS.contains("" + left + right);
    }
}
