package dev.changeling.compile;

import dev.changeling.mutant.EntryMethods;
import dev.changeling.mutant.EntryMethods.EntryMethod;
import dev.changeling.mutant.Mutant;
import dev.changeling.mutant.Point;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeMap;

/**
 * Compiles mutants: every point that can be switched at run time goes into one schema compiled by
 * one javac task; a mutant whose point cannot is compiled on its own, and one that does not compile
 * on its own is stillborn. A schema whose points, files and classpath are the last build's is that build's
 * ({@link SchemaReuse}).
 */
public final class MutantBuild {

    static final String SCHEMA = "schema";
    static final String SCHEMA_SOURCES = "schema-sources";
    static final String ALONE = "alone";
    static final String SCRATCH = "scratch";

    private static final String ONCE_PER_JVM = "runs once per JVM (a static initialiser, a static field's or an "
            + "enum constant's initialiser), where switching at run time cannot reach it";

    private MutantBuild() {
    }

    /** Builds the schema and the mutants that cannot join it; replaces earlier output in the output folder. */
    public static BuildResult compile(BuildRequest request) {
        return compileSchema(request).compileAlone();
    }

    /**
     * Builds the schema only, so that the unmutated suite can run (and be found red) before the mutants that
     * cannot join the schema are compiled one by one ({@link SchemaStage#compileAlone()}).
     */
    public static SchemaStage compileSchema(BuildRequest request) {
        Path output = request.outputDirectory().toAbsolutePath().normalize();
        for (String folder : List.of(ALONE, SCRATCH)) {
            Outputs.deleteTree(output.resolve(folder));
        }
        Map<String, Placement> placements = new LinkedHashMap<>();
        Map<String, Mutant> runnable = new LinkedHashMap<>();
        for (Mutant mutant : request.mutants()) {
            if (mutant.oncePerJvm()) {
                placements.put(mutant.fingerprint(), Placement.oncePerJvm(ONCE_PER_JVM));
            } else {
                runnable.putIfAbsent(mutant.fingerprint(), mutant);
            }
        }
        Set<Point> candidates = new LinkedHashSet<>();
        runnable.values().forEach(mutant -> candidates.addAll(mutant.points()));

        Map<String, List<EntryMethod>> methods = new TreeMap<>();
        candidates.stream().map(Point::file).distinct().forEach(path -> methods.put(path,
                request.entryMethods().containsKey(path) ? request.entryMethods().get(path) : EntryMethods.of(request.files().get(path))));
        SchemaReuse.Inputs inputs = SchemaReuse.inputs(candidates, request.files(), methods, request.classpath());
        Optional<SchemaReuse.Kept> last = SchemaReuse.read(output);
        SchemaCompiler.Outcome kept = SchemaReuse.reuse(last, output, inputs, candidates).orElse(null);
        if (kept == null) {
            for (String folder : List.of(SCHEMA, SCHEMA_SOURCES)) {
                Outputs.deleteTree(output.resolve(folder));
            }
            createFolder(output.resolve(SCHEMA));
        }
        try (Javac javac = new Javac(request.classpath())) {
            SchemaCompiler.Outcome schema = kept;
            if (schema == null) {
                schema = new SchemaCompiler(javac, request.files(), methods, output.resolve(SCHEMA), output.resolve(SCHEMA_SOURCES),
                        output.resolve(SCRATCH)).compile(candidates, SchemaReuse.carried(last, inputs, candidates));
                SchemaReuse.keep(output, inputs, schema);
            }
            Map<Point, Integer> ids = new HashMap<>();
            schema.points().forEach(point -> ids.put(point, ids.size()));
            List<AloneCompiler.Job> pending = new ArrayList<>();
            for (Mutant mutant : runnable.values()) {
                String reason = reasonToLeave(mutant, ids, schema.evicted());
                String stillborn = reason == null ? null : certainlyStillborn(mutant, schema.stillborn());
                if (reason == null) {
                    placements.put(mutant.fingerprint(),
                            Placement.inSchema(mutant.points().stream().map(ids::get).toList()));
                } else if (stillborn != null) {
                    placements.put(mutant.fingerprint(), Placement.stillborn(stillborn));
                } else {
                    pending.add(new AloneCompiler.Job(mutant, request.files().get(mutant.file()),
                            output.resolve(ALONE).resolve(mutant.fingerprint()), reason));
                }
            }
            return new SchemaStage(request.classpath(), output, schema, placements, pending);
        }
    }

    /** Null when every point of the mutant is in the schema; else why the mutant must be compiled alone. */
    private static String reasonToLeave(Mutant mutant, Map<Point, Integer> ids, Map<Point, String> evicted) {
        for (Point point : mutant.points()) {
            if (!ids.containsKey(point)) {
                String why = evicted.getOrDefault(point, "it is not in the schema");
                return mutant.order() == 1 ? why : "its change at line " + point.line() + " left the schema: " + why;
            }
        }
        return null;
    }

    /**
     * The error of the first point (by line) that javac has already shown cannot compile, or null: the
     * mutant's own file holds the same ill-typed expression, so compiling it would only repeat the error.
     */
    private static String certainlyStillborn(Mutant mutant, Map<Point, String> stillborn) {
        return mutant.points().stream()
                .filter(stillborn::containsKey)
                .min(Comparator.comparingInt(Point::line))
                .map(stillborn::get)
                .orElse(null);
    }

    private static void createFolder(Path folder) {
        try {
            Files.createDirectories(folder);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot create " + folder, e);
        }
    }
}
