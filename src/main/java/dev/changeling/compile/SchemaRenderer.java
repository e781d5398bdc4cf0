package dev.changeling.compile;

import dev.changeling.compile.RenderedFile.Branch;
import dev.changeling.compile.RenderedFile.HostRegion;
import dev.changeling.mutant.HostKind;
import dev.changeling.mutant.Point;
import dev.changeling.source.SourceFile;
import dev.changeling.source.Span;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.Deque;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.NavigableMap;
import java.util.TreeMap;
import java.util.function.Predicate;

/**
 * Rewrites one file's original text into its schema: every host becomes a switch over its points, the methods whose
 * entry is noted ({@link dev.changeling.mutant.EntryMethods}) begin with {@code Probe.enter(id);} on the line of their
 * opening brace, and every other character stays as it was, so line numbers and comments survive.
 */
final class SchemaRenderer {

    static final String PROBE = "dev.changeling.probe.Probe";

    private record HostKey(Span span, HostKind kind) {
    }

    private record Host(Span span, HostKind kind, List<Point> points, List<Host> inner) {
    }

    private final String original;
    private final Map<Point, Integer> ids;
    private final Predicate<Point> watched;
    private final NavigableMap<Integer, Integer> notes;
    private final StringBuilder out;
    private final List<HostRegion> regions = new ArrayList<>();

    private SchemaRenderer(String original, Map<Point, Integer> ids, Predicate<Point> watched, NavigableMap<Integer, Integer> notes) {
        this.original = original;
        this.ids = ids;
        this.watched = watched;
        this.notes = notes;
        this.out = new StringBuilder(original.length() + original.length() / 4);
    }

    /**
     * The schema of {@code file} switching {@code points}, each under its id; the points {@code watched} accepts (see
     * {@link InfectionWatch}) also compare their mutated value with the original's while the baseline records.
     */
    static RenderedFile render(SourceFile file, Collection<Point> points, Map<Point, Integer> ids, Predicate<Point> watched) {
        return render(file, points, ids, watched, new TreeMap<>());
    }

    /** The same, with a note of entry at each offset of {@code notes} (just inside a method's opening brace), under its id. */
    static RenderedFile render(SourceFile file, Collection<Point> points, Map<Point, Integer> ids, Predicate<Point> watched,
                               NavigableMap<Integer, Integer> notes) {
        Map<Point, String> rejected = new LinkedHashMap<>();
        List<Host> roots = nest(wholeStatements(file, hosts(points, ids), rejected), rejected);
        SchemaRenderer renderer = new SchemaRenderer(file.text(), ids, watched, new TreeMap<>(notes));
        renderer.emitRange(0, file.text().length(), roots);
        return new RenderedFile(file, renderer.out.toString(), List.copyOf(renderer.regions), Map.copyOf(rejected));
    }

    private static List<Host> hosts(Collection<Point> points, Map<Point, Integer> ids) {
        Map<HostKey, List<Point>> grouped = new LinkedHashMap<>();
        for (Point point : points) {
            grouped.computeIfAbsent(new HostKey(point.host(), point.kind()), key -> new ArrayList<>()).add(point);
        }
        List<Host> hosts = new ArrayList<>();
        grouped.forEach((key, members) -> {
            members.sort(Comparator.comparing(ids::get));
            hosts.add(new Host(key.span(), key.kind(), members, new ArrayList<>()));
        });
        hosts.sort(Comparator.comparing(Host::span).thenComparing(Host::kind));
        return hosts;
    }

    /**
     * Statement hosts that do not end as a statement does (an expression lambda's body, which the tree
     * also calls a statement) cannot be put in a block, so their points are rejected.
     */
    private static List<Host> wholeStatements(SourceFile file, List<Host> hosts, Map<Point, String> rejected) {
        List<Host> kept = new ArrayList<>();
        for (Host host : hosts) {
            String text = file.textOf(host.span()).strip();
            if (host.kind() == HostKind.STATEMENT && !text.endsWith(";") && !text.endsWith("}")) {
                host.points().forEach(point -> rejected.put(point, "its host is not a whole statement"));
            } else {
                kept.add(host);
            }
        }
        return kept;
    }

    /** Arranges hosts into a forest by containment; a host that overlaps another without nesting is rejected. */
    private static List<Host> nest(List<Host> sorted, Map<Point, String> rejected) {
        List<Host> roots = new ArrayList<>();
        Deque<Host> open = new ArrayDeque<>();
        for (Host host : sorted) {
            while (!open.isEmpty() && open.peek().span().end() <= host.span().begin()) {
                open.pop();
            }
            if (!open.isEmpty() && !open.peek().span().contains(host.span())) {
                host.points().forEach(point -> rejected.put(point, "its host overlaps another host without nesting in it"));
                continue;
            }
            (open.isEmpty() ? roots : open.peek().inner()).add(host);
            open.push(host);
        }
        return roots;
    }

    private void emitRange(int from, int to, List<Host> hosts) {
        int cursor = from;
        for (Host host : hosts) {
            copy(cursor, host.span().begin());
            emitHost(host);
            cursor = host.span().end();
        }
        copy(cursor, to);
    }

    /**
     * The original text from {@code from} to {@code to}, with the notes of entry that fall there, one at the end
     * included: a method's first statement can be a host, and its note must come before it.
     */
    private void copy(int from, int to) {
        int at = from;
        NavigableMap<Integer, Integer> here = notes.subMap(from, true, to, true);
        for (Map.Entry<Integer, Integer> note : List.copyOf(here.entrySet())) {
            out.append(original, at, note.getKey()).append(PROBE).append(".enter(").append(note.getValue()).append("); ");
            at = note.getKey();
            notes.remove(note.getKey());
        }
        out.append(original, at, to);
    }

    private void emitHost(Host host) {
        int begin = out.length();
        int slot = regions.size();
        regions.add(null);
        List<Branch> mutated = new ArrayList<>();
        Branch originalBranch;
        switch (host.kind()) {
            case EXPRESSION -> {
                out.append('(');
                chain(host, mutated);
                watch(host, mutated);
                originalBranch = originalExpression(host);
                out.append(')');
            }
            case STATEMENT_EXPRESSION -> {
                // a call that hands back its argument is a statement expression with a value, as i++ is, so the
                // switch can stand in a statement, a for-loop update and a void or a value lambda's body alike
                out.append(PROBE).append(".pass(");
                chain(host, mutated);
                originalBranch = originalExpression(host);
                out.append(')');
            }
            case STATEMENT -> originalBranch = statementSwitch(host, mutated);
            default -> throw new IllegalStateException("unknown host kind " + host.kind());
        }
        regions.set(slot, new HostRegion(host.points(), host.kind(), begin, out.length(), List.copyOf(mutated),
                originalBranch));
    }

    private void chain(Host host, List<Branch> mutated) {
        for (Point point : host.points()) {
            out.append(PROBE).append(".on(").append(ids.get(point)).append(") ? ");
            int begin = out.length();
            out.append('(').append(oneLine(point.mutatedHost(original))).append(')');
            mutated.add(new Branch(point, begin, out.length()));
            out.append(" : ");
        }
    }

    /**
     * For the watched points, a link before the original that, while the baseline records,
     * evaluates each mutated expression beside the original and notes the ones that differ; it always goes on to the
     * original. Each mutated copy is one more branch of its point, so a compile error there is that point's.
     */
    private void watch(Host host, List<Branch> mutated) {
        List<Point> watchedHere = host.points().stream().filter(watched).toList();
        if (watchedHere.isEmpty()) {
            return;
        }
        String plainOriginal = "(" + oneLine(original.substring(host.span().begin(), host.span().end())) + ")";
        out.append(PROBE).append(".watching() && (");
        for (int i = 0; i < watchedHere.size(); i++) {
            Point point = watchedHere.get(i);
            out.append(i == 0 ? "" : " | ").append(PROBE).append(".differs(").append(ids.get(point)).append(", ");
            int begin = out.length();
            out.append('(').append(oneLine(point.mutatedHost(original))).append(')');
            mutated.add(new Branch(point, begin, out.length()));
            out.append(" != ").append(plainOriginal).append(')');
        }
        out.append(") ? ").append(plainOriginal).append(" : ");
    }

    private Branch originalExpression(Host host) {
        int begin = out.length();
        out.append('(');
        emitRange(host.span().begin(), host.span().end(), host.inner());
        out.append(')');
        return new Branch(null, begin, out.length());
    }

    /**
     * The whole switch sits in a block of its own: an {@code if} without one could capture a following
     * {@code else}, and an arrow case label takes a block but not an {@code if}.
     */
    private Branch statementSwitch(Host host, List<Branch> mutated) {
        out.append("{ ");
        List<Point> points = host.points();
        if (points.size() == 1 && points.get(0).mutatedHost(original).isBlank()) {
            out.append("if (!").append(PROBE).append(".on(").append(ids.get(points.get(0))).append(")) ");
        } else {
            for (int i = 0; i < points.size(); i++) {
                Point point = points.get(i);
                out.append(i == 0 ? "if (" : " else if (").append(PROBE).append(".on(").append(ids.get(point)).append(")) ");
                int begin = out.length();
                out.append("{ ").append(oneLine(point.mutatedHost(original))).append(" }");
                mutated.add(new Branch(point, begin, out.length()));
            }
            out.append(" else ");
        }
        int begin = out.length();
        out.append("{ ");
        emitRange(host.span().begin(), host.span().end(), host.inner());
        out.append(" }");
        Branch originalBranch = new Branch(null, begin, out.length());
        out.append(" }");
        return originalBranch;
    }

    /**
     * A mutated branch is an extra copy of text the original already has, so its line breaks would
     * push every later line down: they become spaces and line comments are dropped. Only a text
     * block, whose line breaks are part of its value, keeps the text as it is.
     */
    static String oneLine(String text) {
        if (text.indexOf('\n') < 0 && text.indexOf('\r') < 0) {
            return text;
        }
        StringBuilder out = new StringBuilder(text.length());
        int at = 0;
        while (at < text.length()) {
            char c = text.charAt(at);
            if (text.startsWith("\"\"\"", at)) {
                return text;
            } else if (c == '"' || c == '\'') {
                int end = endOfLiteral(text, at);
                out.append(text, at, end);
                at = end;
            } else if (text.startsWith("//", at)) {
                while (at < text.length() && text.charAt(at) != '\n' && text.charAt(at) != '\r') {
                    at++;
                }
            } else if (text.startsWith("/*", at)) {
                int close = text.indexOf("*/", at + 2);
                int end = close < 0 ? text.length() : close + 2;
                out.append(text.substring(at, end).replace('\r', ' ').replace('\n', ' '));
                at = end;
            } else if (c == '\r' || c == '\n') {
                out.append(' ');
                at += c == '\r' && at + 1 < text.length() && text.charAt(at + 1) == '\n' ? 2 : 1;
            } else {
                out.append(c);
                at++;
            }
        }
        return out.toString();
    }

    /** The offset just past the string or character literal opening at {@code begin}. */
    private static int endOfLiteral(String text, int begin) {
        char quote = text.charAt(begin);
        int at = begin + 1;
        while (at < text.length()) {
            char c = text.charAt(at);
            if (c == '\\') {
                at += 2;
            } else if (c == quote || c == '\n' || c == '\r') {
                return c == quote ? at + 1 : at;
            } else {
                at++;
            }
        }
        return text.length();
    }
}
