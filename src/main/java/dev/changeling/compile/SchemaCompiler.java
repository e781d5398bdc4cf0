package dev.changeling.compile;

import com.sun.source.tree.CompilationUnitTree;
import com.sun.source.util.SourcePositions;
import dev.changeling.UserError;
import dev.changeling.mutant.EntryMethods.EntryMethod;
import dev.changeling.mutant.Point;
import dev.changeling.source.SourceFile;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.NavigableMap;
import java.util.Set;
import java.util.TreeMap;
import java.util.stream.Collectors;
import javax.tools.Diagnostic;
import javax.tools.JavaFileObject;

/**
 * Compiles the schema in rounds: render every file with points, compile them all in one javac task,
 * move the points javac objects to (or whose branches would change type) out, and repeat until clean. The methods
 * whose entry is noted are numbered across the files in path order, in each file in the order of its text.
 */
final class SchemaCompiler {

    /** After this many rounds, a file that still fails leaves the schema whole. */
    static final int ROUNDS_BEFORE_WHOLE_FILES = 6;

    static final Comparator<Point> ID_ORDER = Comparator.comparing(Point::file)
            .thenComparing(Point::edit)
            .thenComparing(Point::host)
            .thenComparing(Point::fingerprint)
            .thenComparing(Point::replacement);

    /**
     * What the rounds produced.
     *
     * @param points     the schema's points, in id order
     * @param evicted    the points that left the schema, each with the reason
     * @param stillborn  of those, the points whose mutants are certain not to compile, with the error
     * @param classNames the binary names of the classes written
     * @param watched    the schema's points whose infection the baseline records ({@link InfectionWatch})
     * @param entries    the methods whose entry the schema notes, in id order
     */
    record Outcome(List<Point> points, Map<Point, String> evicted, Map<Point, String> stillborn,
                   Set<String> classNames, long renderNanos, long compileNanos, int rounds, Set<Point> watched,
                   List<EntryMethod> entries) {
    }

    private final Javac javac;
    private final Map<String, SourceFile> files;
    private final Path classes;
    private final Path sources;
    private final Path scratch;
    private final Set<String> wholeFiles = new HashSet<>();
    private final Set<String> checkedOriginals = new HashSet<>();
    private final Map<Point, String> stillborn = new LinkedHashMap<>();
    private final Map<String, List<EntryMethod>> entryMethods;
    /** Whether each point rendered so far is watched: the same in every round, so worked out once. */
    private final Map<Point, Boolean> watchable = new HashMap<>();
    private long renderNanos;
    private long compileNanos;

    /** @param entryMethods the methods whose entry the schema notes, of every file with points */
    SchemaCompiler(Javac javac, Map<String, SourceFile> files, Map<String, List<EntryMethod>> entryMethods, Path classes,
                   Path sources, Path scratch) {
        this.javac = javac;
        this.files = files;
        this.entryMethods = Map.copyOf(entryMethods);
        this.classes = classes;
        this.sources = sources;
        this.scratch = scratch;
    }

    /** The schema of the candidates less the {@code carried} points, which leave it before the first round. */
    Outcome compile(Collection<Point> candidates, SchemaReuse.Carried carried) {
        Set<Point> schema = new LinkedHashSet<>(candidates);
        Map<Point, String> evicted = new LinkedHashMap<>();
        stillborn.putAll(carried.stillborn());
        leave(schema, evicted, carried.evicted());
        for (int round = 1; ; round++) {
            List<Point> ordered = schema.stream().sorted(ID_ORDER).toList();
            Map<Point, Integer> ids = new HashMap<>();
            ordered.forEach(point -> ids.put(point, ids.size()));
            Map<String, RenderedFile> rendered = render(ordered, ids);
            Map<Point, String> leaving = new LinkedHashMap<>();
            rendered.values().forEach(file -> file.rejected().forEach(leaving::put));
            if (!leaving.isEmpty()) {
                leave(schema, evicted, leaving);
                round--;
                continue;
            }
            if (ordered.isEmpty()) {
                return new Outcome(List.of(), evicted, stillborn, Set.of(), renderNanos, compileNanos, round - 1, Set.of(), List.of());
            }
            long started = System.nanoTime();
            Javac.Task task = javac.task(rendered.values().stream()
                    .map(file -> new Javac.Source(file.path(), file.text())).toList(), classes);
            task.analyze();
            Set<String> failing = trace(task, rendered, leaving);
            if (leaving.isEmpty() && failing.isEmpty()) {
                Set<String> written = task.generate();
                compileNanos += System.nanoTime() - started;
                writeSources(rendered.values());
                return new Outcome(ordered, evicted, stillborn, written, renderNanos, compileNanos, round,
                        ordered.stream().filter(this::watched).collect(Collectors.toUnmodifiableSet()),
                        rendered.keySet().stream().flatMap(path -> entryMethods.getOrDefault(path, List.of()).stream()).toList());
            }
            compileNanos += System.nanoTime() - started;
            if (round >= ROUNDS_BEFORE_WHOLE_FILES || leaving.isEmpty()) {
                for (String path : failing) {
                    rendered.get(path).points().forEach(point -> leaving.putIfAbsent(point,
                            "its file's schema did not compile after " + ROUNDS_BEFORE_WHOLE_FILES + " rounds"));
                }
                wholeFiles.addAll(failing);
            }
            checkOriginalsCompile(rendered);
            leave(schema, evicted, leaving);
        }
    }

    private Map<String, RenderedFile> render(List<Point> ordered, Map<Point, Integer> ids) {
        long started = System.nanoTime();
        Map<String, List<Point>> byFile = new TreeMap<>();
        ordered.forEach(point -> byFile.computeIfAbsent(point.file(), path -> new ArrayList<>()).add(point));
        Map<String, RenderedFile> rendered = new LinkedHashMap<>();
        int entries = 0;
        for (Map.Entry<String, List<Point>> file : byFile.entrySet()) {
            SourceFile source = files.get(file.getKey());
            NavigableMap<Integer, Integer> notes = new TreeMap<>();
            for (EntryMethod method : entryMethods.getOrDefault(file.getKey(), List.of())) {
                notes.put(method.noteAt(), entries++);
            }
            rendered.put(file.getKey(), SchemaRenderer.render(source, file.getValue(), ids, this::watched, notes));
        }
        renderNanos += System.nanoTime() - started;
        return rendered;
    }

    private boolean watched(Point point) {
        return watchable.computeIfAbsent(point, unknown -> InfectionWatch.watchable(point, files.get(point.file()).text()));
    }

    /** Adds the points to move out to {@code leaving}; the paths of the files with errors. */
    private Set<String> trace(Javac.Task task, Map<String, RenderedFile> rendered, Map<Point, String> leaving) {
        Map<String, List<Diagnostic<? extends JavaFileObject>>> errorsByFile = new LinkedHashMap<>();
        for (Diagnostic<? extends JavaFileObject> error : task.errors()) {
            String path = Javac.pathOf(error.getSource());
            errorsByFile.computeIfAbsent(path, p -> new ArrayList<>()).add(error);
        }
        SourcePositions positions = task.trees().getSourcePositions();
        for (CompilationUnitTree unit : task.units()) {
            RenderedFile file = rendered.get(Javac.pathOf(unit.getSourceFile()));
            List<Diagnostic<? extends JavaFileObject>> errors = errorsByFile.getOrDefault(file.path(), List.of());
            Map<Point, String> misfits = new LinkedHashMap<>(LoopConditionSwitches.constantSides(task, unit, file));
            StatementContexts.outsideBlocks(task, unit, file).forEach(misfits::putIfAbsent);
            if (!errors.isEmpty()) {
                ErrorAttribution.Traced traced = ErrorAttribution.trace(file, errors, MemberSpans.of(unit, positions),
                        misfits.keySet());
                traced.evicted().forEach(leaving::putIfAbsent);
                traced.stillborn().forEach(stillborn::putIfAbsent);
                if (traced.wholeFile()) {
                    wholeFiles.add(file.path());
                }
            }
            misfits.forEach(leaving::putIfAbsent);
            BranchTypes.mismatches(task, unit, file).forEach(leaving::putIfAbsent);
        }
        return errorsByFile.keySet();
    }

    /**
     * A file whose errors could be pinned on nothing narrower than the file is compiled once as it
     * stands: if the original itself does not compile, the classpath is wrong, and every mutant would
     * otherwise look stillborn.
     */
    private void checkOriginalsCompile(Map<String, RenderedFile> rendered) {
        for (String path : wholeFiles) {
            if (checkedOriginals.add(path)) {
                Path output = scratch.resolve("original-check");
                Javac.Task task = javac.task(List.of(new Javac.Source(path, rendered.get(path).source().text())), output);
                task.analyze();
                Outputs.deleteTree(output);
                if (!task.errors().isEmpty()) {
                    throw new UserError(Javac.describe(task.errors().get(0))
                            + " (the unmutated file does not compile against the classpath; build the project first)");
                }
            }
        }
    }

    private static void leave(Set<Point> schema, Map<Point, String> evicted, Map<Point, String> leaving) {
        schema.removeAll(leaving.keySet());
        leaving.forEach(evicted::putIfAbsent);
    }

    private void writeSources(Collection<RenderedFile> rendered) {
        try {
            for (RenderedFile file : rendered) {
                Path target = sources.resolve(file.path());
                Files.createDirectories(target.getParent());
                Files.writeString(target, file.text(), StandardCharsets.UTF_8);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
