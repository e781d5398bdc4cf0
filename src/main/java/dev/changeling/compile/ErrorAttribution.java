package dev.changeling.compile;

import dev.changeling.compile.RenderedFile.Branch;
import dev.changeling.compile.RenderedFile.HostRegion;
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
 * cannot be traced moves its likely {@link Culprits}. An error that may only echo another waits a round.
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
    static final String UNKNOWN_NAME = "compiler.err.cant.resolve";

    private static final String NEIGHBOURS = "moved with its neighbours after an error the schema could not trace: ";

    /**
     * An operator applied to operands it does not take, at the operator a branch put there: the
     * mutant's own file has the same operands in the same scope, so it cannot compile either.
     */
    private static final Set<String> BAD_OPERANDS = Set.of(
            "compiler.err.operator.cant.be.applied", "compiler.err.operator.cant.be.applied.1");

    /**
     * What one file's errors decide.
     *
     * @param evicted   the points to move out of the schema, each with the reason
     * @param stillborn of those, the ones whose own file is certain not to compile, with the error
     * @param wholeFile  whether an error could be pinned on nothing narrower than the whole file
     */
    record Traced(Map<Point, String> evicted, Map<Point, String> stillborn, boolean wholeFile) {
    }

    private ErrorAttribution() {
    }

    /** How one error was traced: to one point's branch, to a whole host, or to nothing in particular. */
    private enum Trace { BRANCH, HOST, FLOW, UNTRACED }

    /**
     * Traces one file's errors. {@code leavingAnyway} are points already known to leave (a constant
     * loop condition, a lone body): flow errors in their members may be their doing, so those wait for
     * the next round.
     */
    static Traced trace(RenderedFile file, List<Diagnostic<? extends JavaFileObject>> errors, MemberSpans members,
                        Set<Point> leavingAnyway) {
        List<Trace> traces = errors.stream().map(error -> trace(file, error)).toList();
        Set<Span> withBranchErrors = new HashSet<>();
        for (int i = 0; i < errors.size(); i++) {
            if (traces.get(i) == Trace.BRANCH) {
                withBranchErrors.add(memberOf(members, errors.get(i)));
            }
        }
        Set<Span> withLeavingPoints = new HashSet<>();
        for (HostRegion host : file.hosts()) {
            if (host.points().stream().anyMatch(leavingAnyway::contains)) {
                withLeavingPoints.add(members.innermostAt(host.begin()));
            }
        }
        // an untraced error beside a branch error may be its echo (a call whose argument has no type); the next round tells
        List<Boolean> deferred = new ArrayList<>();
        Set<Span> withUntracedErrors = new HashSet<>();
        for (int i = 0; i < errors.size(); i++) {
            Span member = memberOf(members, errors.get(i));
            boolean untraced = traces.get(i) == Trace.UNTRACED || traces.get(i) == Trace.FLOW;
            boolean defer = (traces.get(i) == Trace.UNTRACED && withBranchErrors.contains(member))
                    || (untraced && withLeavingPoints.contains(member));
            deferred.add(defer);
            if (!defer && untraced) {
                withUntracedErrors.add(member);
            }
        }
        Map<Point, String> evicted = new LinkedHashMap<>();
        Map<Point, String> stillborn = new LinkedHashMap<>();
        boolean wholeFile = false;
        for (int i = 0; i < errors.size(); i++) {
            Diagnostic<? extends JavaFileObject> error = errors.get(i);
            String reason = Javac.describe(error);
            int offset = offsetOf(error);
            Span member = memberOf(members, error);
            switch (traces.get(i)) {
                case BRANCH -> {
                    Branch branch = file.mutatedBranchAt(offset);
                    evicted.putIfAbsent(branch.point(), "javac rejected its branch in the schema: " + reason);
                    if (atEditedOperator(file, branch, error)) {
                        stillborn.putIfAbsent(branch.point(), branch.point().file() + ":" + branch.point().line() + ": "
                                + Javac.firstLine(error));
                    }
                }
                case HOST -> {
                    HostRegion host = file.innermostHostAt(offset);
                    // beside an untraced error this may be its echo (an operand of unknown type); the next round tells
                    if (!withUntracedErrors.contains(member)) {
                        host.points().forEach(point -> evicted.putIfAbsent(point,
                                "javac rejected the switch around it: " + reason));
                    }
                }
                case FLOW, UNTRACED -> {
                    if (!deferred.get(i)) {
                        List<Point> culprits = Culprits.of(file, member, error);
                        wholeFile |= culprits.size() == file.points().size();
                        culprits.forEach(point -> evicted.putIfAbsent(point, NEIGHBOURS + reason));
                    }
                }
                default -> throw new IllegalStateException(traces.get(i).toString());
            }
        }
        return new Traced(evicted, stillborn, wholeFile);
    }

    /** Whether the error is a bad-operands error at the text the point's edit put into its branch. */
    private static boolean atEditedOperator(RenderedFile file, Branch branch, Diagnostic<? extends JavaFileObject> error) {
        String code = error.getCode() == null ? "" : error.getCode();
        Point point = branch.point();
        String before = file.source().text().substring(point.host().begin(), point.edit().begin());
        if (!BAD_OPERANDS.contains(code) || point.replacement().isBlank() || before.indexOf('\n') >= 0
                || before.indexOf('\r') >= 0) {
            return false;
        }
        int editBegin = branch.begin() + 1 + before.length();
        int offset = offsetOf(error);
        return editBegin <= offset && offset < editBegin + point.replacement().length();
    }

    private static Trace trace(RenderedFile file, Diagnostic<? extends JavaFileObject> error) {
        int offset = offsetOf(error);
        String code = error.getCode() == null ? "" : error.getCode().toLowerCase(Locale.ROOT);
        if (FLOW.contains(code)) {
            return Trace.FLOW;
        }
        HostRegion host = offset < 0 ? null : file.innermostHostAt(offset);
        if (host == null) {
            return Trace.UNTRACED;
        }
        boolean unknownName = code.startsWith(UNKNOWN_NAME);
        if (file.mutatedBranchAt(offset) != null && !(unknownName && originalMentions(file, host, error))) {
            return Trace.BRANCH;
        }
        return unknownName ? Trace.UNTRACED : Trace.HOST;
    }

    private static Span memberOf(MemberSpans members, Diagnostic<? extends JavaFileObject> error) {
        int offset = offsetOf(error);
        return offset < 0 ? null : members.innermostAt(offset);
    }

    static Pattern word(String name) {
        return Pattern.compile("(?<![\\w$])" + Pattern.quote(name) + "(?![\\w$])");
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
        return word(name).matcher(original).find();
    }

    private static int offsetOf(Diagnostic<? extends JavaFileObject> error) {
        long offset = error.getPosition();
        if (offset == Diagnostic.NOPOS) {
            offset = error.getStartPosition();
        }
        return offset == Diagnostic.NOPOS ? -1 : (int) offset;
    }
}
