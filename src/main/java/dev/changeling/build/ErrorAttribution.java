package dev.changeling.build;

import dev.changeling.build.RenderedFile.Branch;
import dev.changeling.build.RenderedFile.HostRegion;
import dev.changeling.mutant.HostKind;
import dev.changeling.mutant.Point;
import dev.changeling.source.Span;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.regex.Pattern;
import javax.tools.Diagnostic;
import javax.tools.JavaFileObject;

/**
 * Traces javac's errors in one schema file back to the points that caused them: an error in a
 * mutated branch is that point's, an error elsewhere in a switch is its host's, and an error that
 * cannot be traced moves the statement deletions of its member, then the member, then the file.
 */
final class ErrorAttribution {

    /**
     * Flow errors appear where the symptom is (a later use, the end of a method), not where the cause
     * is (a deleted assignment or return), so their position proves nothing.
     */
    private static final Set<String> FLOW = Set.of(
            "compiler.err.var.might.not.have.been.initialized",
            "compiler.err.var.not.initialized.in.default.constructor",
            "compiler.err.var.might.already.be.assigned",
            "compiler.err.var.might.be.assigned.in.loop",
            "compiler.err.missing.ret.stmt",
            "compiler.err.unreachable.stmt",
            "compiler.err.initializer.must.be.able.to.complete.normally",
            "compiler.err.except.never.thrown.in.try",
            "compiler.err.cant.ref.non.effectively.final.var",
            "compiler.err.not.exhaustive",
            "compiler.err.not.exhaustive.statement",
            "compiler.err.switch.expression.completes.normally");

    /**
     * A name that cannot be found has usually left its scope (a deleted declaration, a pattern binding
     * now inside a switch), so its position names the cause only if the original host lacks the name.
     */
    private static final String UNKNOWN_NAME = "compiler.err.cant.resolve";

    private static final String NEIGHBOURS = "moved with its neighbours after an error the schema could not trace: ";

    private ErrorAttribution() {
    }

    /** How one error was traced: to one point's branch, to a whole host, or to nothing in particular. */
    private enum Trace { BRANCH, HOST, UNTRACED }

    /** The points to move out of the schema, each with the reason. */
    static Map<Point, String> evictions(RenderedFile file, List<Diagnostic<? extends JavaFileObject>> errors,
                                        MemberSpans members) {
        List<Trace> traces = new ArrayList<>();
        Set<Span> untracedMembers = new HashSet<>();
        for (Diagnostic<? extends JavaFileObject> error : errors) {
            Trace trace = trace(file, error);
            traces.add(trace);
            if (trace == Trace.UNTRACED) {
                untracedMembers.add(memberOf(members, error));
            }
        }
        Map<Point, String> evicted = new LinkedHashMap<>();
        for (int i = 0; i < errors.size(); i++) {
            Diagnostic<? extends JavaFileObject> error = errors.get(i);
            String reason = Javac.describe(error);
            int offset = offsetOf(error);
            Span member = memberOf(members, error);
            switch (traces.get(i)) {
                case BRANCH -> evicted.putIfAbsent(file.mutatedBranchAt(offset).point(),
                        "javac rejected its branch in the schema: " + reason);
                case HOST -> {
                    // beside an untraced error this may be its echo (an operand of unknown type); the next round tells
                    if (!untracedMembers.contains(member)) {
                        file.innermostHostAt(offset).points().forEach(point -> evicted.putIfAbsent(point,
                                "javac rejected the switch around it: " + reason));
                    }
                }
                case UNTRACED -> untraced(file, member).forEach(point -> evicted.putIfAbsent(point, NEIGHBOURS + reason));
                default -> throw new IllegalStateException();
            }
        }
        return evicted;
    }

    private static Trace trace(RenderedFile file, Diagnostic<? extends JavaFileObject> error) {
        int offset = offsetOf(error);
        if (offset < 0) {
            return Trace.UNTRACED;
        }
        String code = error.getCode() == null ? "" : error.getCode().toLowerCase(Locale.ROOT);
        boolean unknownName = code.startsWith(UNKNOWN_NAME);
        HostRegion host = file.innermostHostAt(offset);
        if (FLOW.contains(code) || host == null) {
            return Trace.UNTRACED;
        }
        if (file.mutatedBranchAt(offset) != null && !(unknownName && originalMentions(file, host, error))) {
            return Trace.BRANCH;
        }
        return unknownName ? Trace.UNTRACED : Trace.HOST;
    }

    private static Span memberOf(MemberSpans members, Diagnostic<? extends JavaFileObject> error) {
        int offset = offsetOf(error);
        return offset < 0 ? null : members.innermostAt(offset);
    }

    private static List<Point> untraced(RenderedFile file, Span member) {
        if (member != null) {
            List<Point> inMember = file.pointsWithin(member.begin(), member.end());
            List<Point> deletions = inMember.stream().filter(point -> point.kind() == HostKind.STATEMENT).toList();
            if (!deletions.isEmpty()) {
                return deletions;
            }
            if (!inMember.isEmpty()) {
                return inMember;
            }
        }
        return file.points();
    }

    /** Whether the name javac could not find is written in the host's original text too, so the branch did not bring it. */
    private static boolean originalMentions(RenderedFile file, HostRegion host, Diagnostic<? extends JavaFileObject> error) {
        long begin = error.getStartPosition();
        long end = error.getEndPosition();
        if (begin == Diagnostic.NOPOS || end <= begin || end > file.text().length()) {
            return true;
        }
        String name = file.text().substring((int) begin, (int) end);
        String original = file.source().textOf(host.points().get(0).host());
        return Pattern.compile("(?<![\\w$])" + Pattern.quote(name) + "(?![\\w$])").matcher(original).find();
    }

    private static int offsetOf(Diagnostic<? extends JavaFileObject> error) {
        long offset = error.getPosition();
        if (offset == Diagnostic.NOPOS) {
            offset = error.getStartPosition();
        }
        return offset == Diagnostic.NOPOS ? -1 : (int) offset;
    }
}
