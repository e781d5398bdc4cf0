package dev.changeling.compile;

import dev.changeling.mutant.EntryMethods.EntryMethod;
import dev.changeling.mutant.Point;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;

/**
 * A build halfway: the schema is compiled (its points have ids, the mutants in it are placed) and the mutants
 * that must be compiled from their own files are still waiting, so that a red baseline is found before any of
 * them is compiled.
 */
public final class SchemaStage {

    private final List<Path> classpath;
    private final Path output;
    private final SchemaCompiler.Outcome schema;
    private final Map<String, Placement> placements;
    private final List<AloneCompiler.Job> pending;

    SchemaStage(List<Path> classpath, Path output, SchemaCompiler.Outcome schema, Map<String, Placement> placements,
                List<AloneCompiler.Job> pending) {
        this.classpath = List.copyOf(classpath);
        this.output = output;
        this.schema = schema;
        this.placements = new LinkedHashMap<>(placements);
        this.pending = List.copyOf(pending);
    }

    /** How many points the schema has: what {@code Probe.prepare} is given. */
    public int pointCount() {
        return schema.points().size();
    }

    /** How many methods the schema notes the entry of: what {@code Probe.prepare} is given beside the points. */
    public int methodCount() {
        return schema.entries().size();
    }

    /** The methods whose entry the schema notes; a method's id is its index. */
    public List<EntryMethod> entries() {
        return schema.entries();
    }

    /** The schema's points; a point's id is its index. */
    public List<Point> points() {
        return schema.points();
    }

    /** The folder of schema classes, to go first on a worker's classpath. */
    public Path schemaClasses() {
        return output.resolve(MutantBuild.SCHEMA);
    }

    /** Compiles the waiting mutants, each from its own file, and gives the whole build. */
    public BuildResult compileAlone() {
        long started = System.nanoTime();
        Map<String, Placement> all = new LinkedHashMap<>(placements);
        int tasks = 0;
        if (!pending.isEmpty()) {
            try (Javac javac = new Javac(classpath)) {
                AloneCompiler alone = new AloneCompiler(javac);
                all.putAll(alone.compile(pending));
                tasks = alone.tasks();
            }
        }
        Outputs.deleteTree(output.resolve(MutantBuild.SCRATCH));
        BuildTimings timings = new BuildTimings(millis(schema.renderNanos()), millis(schema.compileNanos()),
                millis(System.nanoTime() - started), schema.rounds(), pending.size(), tasks);
        return new BuildResult(schema.points(), all, schemaClasses(), new ArrayList<>(schema.classNames()), timings,
                schema.watched(), schema.entries());
    }

    private static long millis(long nanos) {
        return TimeUnit.NANOSECONDS.toMillis(nanos);
    }
}
