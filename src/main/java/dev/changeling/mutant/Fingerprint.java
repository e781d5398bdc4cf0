package dev.changeling.mutant;

import dev.changeling.source.SourceHash;
import java.util.List;

/**
 * Stable mutant identity: a SHA-256 over the path, enclosing type and member, operator, the
 * whitespace-normalised original snippet, the replacement and the ordinal among identical tuples in
 * that member. Line numbers are deliberately left out so that edits elsewhere keep the identity.
 */
public final class Fingerprint {

    private static final char SEPARATOR = '\u001f';

    private Fingerprint() {
    }

    public static String of(String path, String type, String member, String operator,
                            String snippet, String replacement, int ordinal) {
        return sha256(String.join(String.valueOf(SEPARATOR),
                path, type, member, operator, snippet, replacement, Integer.toString(ordinal)));
    }

    /** Identity of a k-order mutant: the sorted identities of its points. */
    public static String ofCombination(List<Point> points) {
        StringBuilder joined = new StringBuilder("k-order");
        points.stream().map(Point::fingerprint).sorted().forEach(f -> joined.append(SEPARATOR).append(f));
        return sha256(joined.toString());
    }

    /** The tuple that an ordinal counts within: everything but the ordinal itself. */
    static String tupleKey(String path, String type, String member, String operator, String snippet, String replacement) {
        return String.join(String.valueOf(SEPARATOR), path, type, member, operator, snippet, replacement);
    }

    private static String sha256(String text) {
        return SourceHash.sha256(text);
    }
}
