package dev.changeling.compile;

import dev.changeling.mutant.HostKind;
import dev.changeling.mutant.Point;
import dev.changeling.source.Span;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Pattern;
import javax.tools.Diagnostic;
import javax.tools.JavaFileObject;

/**
 * Chooses which points leave the schema for an error that stands away from its cause: the statement
 * deletions of the error's member that most likely caused it, else all of that member's deletions,
 * else all of its points, else the whole file.
 */
final class Culprits {

    /** Definite-assignment errors stand at their variable; the deletion that assigned it is the likely cause. */
    private static final Set<String> NAMES_A_VARIABLE = Set.of(
            "compiler.err.var.might.not.have.been.initialized",
            "compiler.err.var.not.initialized.in.default.constructor");

    private static final Map<String, Pattern> ENDING_THE_FLOW = Map.of(
            "compiler.err.missing.ret.stmt", Pattern.compile("(?:return|throw)(?![\\w$])"),
            "compiler.err.unreachable.stmt", Pattern.compile("break(?![\\w$])"));

    private static final Pattern IDENTIFIER = Pattern.compile("[\\p{L}_$][\\p{L}\\p{N}_$]*");

    private Culprits() {
    }

    /** The points to move for an error standing in {@code member} (null outside every member). */
    static List<Point> of(RenderedFile file, Span member, Diagnostic<? extends JavaFileObject> error) {
        if (member != null) {
            List<Point> inMember = file.pointsWithin(member.begin(), member.end());
            List<Point> deletions = inMember.stream().filter(point -> point.kind() == HostKind.STATEMENT).toList();
            List<Point> likely = declaringOrAssigning(file, deletions, error);
            if (likely.isEmpty()) {
                likely = endingTheFlow(file, deletions, error);
            }
            if (!likely.isEmpty()) {
                return likely;
            }
            if (!deletions.isEmpty()) {
                return deletions;
            }
            if (!inMember.isEmpty()) {
                return inMember;
            }
        }
        return file.points();
    }

    /**
     * For an error at a variable's name (unassigned, or no longer declared), the deletions whose
     * statement declares or assigns it; none when the error stands elsewhere (a constructor's end).
     */
    private static List<Point> declaringOrAssigning(RenderedFile file, List<Point> deletions,
                                                    Diagnostic<? extends JavaFileObject> error) {
        String code = error.getCode() == null ? "" : error.getCode();
        long begin = error.getStartPosition();
        long end = error.getEndPosition();
        if (!(NAMES_A_VARIABLE.contains(code) || code.startsWith(ErrorAttribution.UNKNOWN_NAME))
                || begin < 0 || end <= begin || end > file.text().length()) {
            return List.of();
        }
        String name = file.text().substring((int) begin, (int) end);
        if (!IDENTIFIER.matcher(name).matches()) {
            return List.of();
        }
        // "name =" (not "=="), "name;" and "name," are how a declaration or an assignment writes it
        Pattern setting = Pattern.compile("(?<![\\w$.])" + Pattern.quote(name) + "\\s*(?:=(?!=)|;|,)");
        return deletions.stream().filter(point -> setting.matcher(file.source().textOf(point.host())).find()).toList();
    }

    /**
     * For a method that may now run off its end, the deleted returns and throws; for code that is now
     * unreachable, the deleted breaks (out of a loop that otherwise never ends).
     */
    private static List<Point> endingTheFlow(RenderedFile file, List<Point> deletions,
                                             Diagnostic<? extends JavaFileObject> error) {
        Pattern statement = ENDING_THE_FLOW.get(error.getCode());
        if (statement == null) {
            return List.of();
        }
        return deletions.stream().filter(point -> statement.matcher(file.source().textOf(point.host())).lookingAt())
                .toList();
    }
}
