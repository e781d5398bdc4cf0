package dev.changeling.mutant;

/** Whitespace normalisation for the text that identities are made of. */
public final class Snippets {

    private Snippets() {
    }

    /** Drops white space, except one blank between two word characters that would otherwise fuse. */
    public static String normalise(String text) {
        StringBuilder out = new StringBuilder(text.length());
        boolean pendingSpace = false;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (Character.isWhitespace(c)) {
                pendingSpace = out.length() > 0;
                continue;
            }
            if (pendingSpace && isWord(out.charAt(out.length() - 1)) && isWord(c)) {
                out.append(' ');
            }
            pendingSpace = false;
            out.append(c);
        }
        return out.toString();
    }

    private static boolean isWord(char c) {
        return Character.isLetterOrDigit(c) || c == '_' || c == '$';
    }
}
