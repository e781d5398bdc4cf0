package dev.changeling.review;

import dev.changeling.mutant.Mutant;
import dev.changeling.mutant.Point;
import dev.changeling.mutant.Snippets;
import dev.changeling.results.MutantResult;
import dev.changeling.results.PointRecord;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.regex.Pattern;
import java.util.stream.Collectors;

/**
 * One mutant the developer judged equivalent, as a line of the equivalents list. Only the
 * fingerprint is matched; the rest is there so a person can read and review the list.
 *
 * @param fingerprint the mutant's full fingerprint (64 hex digits)
 * @param file        project-relative path
 * @param type        the enclosing type
 * @param member      the enclosing member
 * @param operator    the operator id; {@code a+b} for a k-order mutant
 * @param original    the changed code before, whitespace-normalised; {@code " ; "} between the parts of a k-order mutant
 * @param mutated     the same code after the change
 * @param reason      why the mutant is equivalent, in the developer's words (may be empty)
 */
public record EquivalentEntry(
        String fingerprint,
        String file,
        String type,
        String member,
        String operator,
        String original,
        String mutated,
        String reason) {

    private static final Pattern FINGERPRINT = Pattern.compile("[0-9a-f]{64}");
    private static final String PARTS = " ; ";

    /** The order entries are kept in: by file, then type and member, then fingerprint, so that lines stay put. */
    public static final Comparator<EquivalentEntry> ORDER = Comparator.comparing(EquivalentEntry::file)
            .thenComparing(EquivalentEntry::type)
            .thenComparing(EquivalentEntry::member)
            .thenComparing(EquivalentEntry::fingerprint);

    public EquivalentEntry {
        Objects.requireNonNull(fingerprint, "fingerprint");
        fingerprint = fingerprint.toLowerCase(Locale.ROOT);
        if (!isFingerprint(fingerprint)) {
            throw new IllegalArgumentException("'" + fingerprint + "' is not a full fingerprint (64 hexadecimal digits)");
        }
        file = Objects.requireNonNull(file, "file").strip();
        type = Objects.requireNonNull(type, "type").strip();
        member = Objects.requireNonNull(member, "member").strip();
        operator = Objects.requireNonNull(operator, "operator").strip();
        original = Objects.requireNonNull(original, "original").strip();
        mutated = Objects.requireNonNull(mutated, "mutated").strip();
        reason = reason == null ? "" : reason.strip();
        if (file.isEmpty() || operator.isEmpty()) {
            throw new IllegalArgumentException("an entry needs a file and an operator");
        }
    }

    static boolean isFingerprint(String text) {
        return FINGERPRINT.matcher(text).matches();
    }

    /** An entry for a mutant just made from a file's text. */
    public static EquivalentEntry of(Mutant mutant, String fileText, String reason) {
        List<Point> points = mutant.points();
        Point first = points.get(0);
        return new EquivalentEntry(mutant.fingerprint(), first.file(), first.type(), first.member(),
                points.stream().map(Point::operator).collect(Collectors.joining("+")),
                points.stream().map(Point::snippet).collect(Collectors.joining(PARTS)),
                points.stream().map(point -> Snippets.normalise(point.mutatedHost(fileText))).collect(Collectors.joining(PARTS)),
                reason);
    }

    /** An entry for a mutant of the results file. */
    public static EquivalentEntry of(MutantResult mutant, String reason) {
        List<PointRecord> points = mutant.points();
        PointRecord first = points.get(0);
        return new EquivalentEntry(mutant.id(), mutant.file(), first.type(), first.member(),
                points.stream().map(PointRecord::operator).collect(Collectors.joining("+")),
                points.stream().map(EquivalentEntry::before).collect(Collectors.joining(PARTS)),
                points.stream().map(EquivalentEntry::after).collect(Collectors.joining(PARTS)),
                reason);
    }

    /** The host snippet when the edit can be placed in it without doubt, else just the edited text. */
    private static String before(PointRecord point) {
        return placeable(point) ? point.snippet() : Snippets.normalise(point.original());
    }

    private static String after(PointRecord point) {
        if (!placeable(point)) {
            return Snippets.normalise(point.replacement());
        }
        String edited = Snippets.normalise(point.original());
        int at = point.snippet().indexOf(edited);
        return Snippets.normalise(point.snippet().substring(0, at) + " " + point.replacement() + " "
                + point.snippet().substring(at + edited.length()));
    }

    private static boolean placeable(PointRecord point) {
        if (point.snippet() == null || point.original() == null || point.replacement() == null) {
            return false;
        }
        String edited = Snippets.normalise(point.original());
        int at = point.snippet().indexOf(edited);
        return !edited.isEmpty() && at >= 0 && at == point.snippet().lastIndexOf(edited);
    }

    public String shortId() {
        return fingerprint.substring(0, 8);
    }

    /** How many changes the mutant has: 1 for first-order. */
    public int order() {
        return operator.split("\\+").length;
    }

    public List<String> operators() {
        return List.of(operator.split("\\+"));
    }

    public EquivalentEntry withReason(String newReason) {
        return new EquivalentEntry(fingerprint, file, type, member, operator, original, mutated, newReason);
    }
}
