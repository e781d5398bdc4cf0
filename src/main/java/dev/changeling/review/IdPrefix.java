package dev.changeling.review;

import dev.changeling.UserError;
import java.util.List;
import java.util.Locale;
import java.util.function.Function;
import java.util.stream.Collectors;

/**
 * Which one of several mutants (or list entries) the start of an id, as a person types it, names. Every
 * command and key that takes a short id asks here, so the rule and its messages are the same everywhere.
 */
public final class IdPrefix {

    /** The fewest hex digits of a fingerprint that name a mutant. */
    public static final int MIN_LENGTH = 4;

    private static final int SHOWN_DIGITS = 12;

    private IdPrefix() {
    }

    /**
     * The one candidate whose id starts with {@code typed} (case does not matter).
     *
     * @param where says where the candidates are, after "no mutant X", e.g. "in the last run"
     * @param hint  what to do when none fits, after a semicolon
     * @throws UserError when {@code typed} is not an id, fits none, or fits several
     */
    public static <T> T single(String typed, List<T> candidates, Function<T, String> idOf, String where, String hint) {
        if (typed.length() < MIN_LENGTH || !typed.matches("[0-9a-fA-F]+")) {
            throw new UserError("'" + typed + "' is not a mutant id; give at least " + MIN_LENGTH + " of its hex digits");
        }
        String prefix = typed.toLowerCase(Locale.ROOT);
        List<T> matches = candidates.stream().filter(candidate -> idOf.apply(candidate).startsWith(prefix)).toList();
        if (matches.isEmpty()) {
            throw new UserError("no mutant " + typed + " " + where + "; " + hint);
        }
        if (matches.size() > 1) {
            throw new UserError("id " + typed + " fits " + matches.size() + " mutants ("
                    + matches.stream().map(match -> shown(idOf.apply(match))).collect(Collectors.joining(", "))
                    + "); give more digits");
        }
        return matches.get(0);
    }

    private static String shown(String id) {
        return id.substring(0, Math.min(SHOWN_DIGITS, id.length()));
    }
}
