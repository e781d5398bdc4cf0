package dev.changeling.compile;

import dev.changeling.mutant.EntryMethods.EntryMethod;
import dev.changeling.mutant.Mutant;
import dev.changeling.mutant.Point;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.OptionalInt;
import java.util.Set;

/**
 * What a build produced: the schema's points by id, where every mutant ended up, the schema
 * classes and the time it took.
 *
 * @param points           the schema's points; a point's id is its index (dense from 0)
 * @param placements       per mutant fingerprint, where the mutant ended up
 * @param schemaClasses    the folder of schema classes, to go first on a worker's classpath
 * @param schemaClassNames the binary names of every class compiled into it, sorted
 * @param timings          where the time went
 * @param watched          the schema's points whose infection the baseline records ({@link InfectionWatch})
 * @param entries          the schema's methods whose entry it notes; a method's id is its index
 */
public record BuildResult(List<Point> points, Map<String, Placement> placements, Path schemaClasses,
                          List<String> schemaClassNames, BuildTimings timings, Set<Point> watched, List<EntryMethod> entries) {

    public BuildResult {
        points = List.copyOf(points);
        entries = List.copyOf(entries);
        placements = Map.copyOf(placements);
        schemaClassNames = List.copyOf(schemaClassNames);
        watched = Set.copyOf(watched);
    }

    /**
     * Whether the schema watches point {@code id}: the baseline then records, as the reach of id
     * {@code pointCount() + id}, each test for which its mutated value differed ({@code Probe.differs}).
     */
    public boolean watches(int id) {
        return watched.contains(points.get(id));
    }

    /** How many points the schema has: what {@code Probe.prepare} is given. */
    public int pointCount() {
        return points.size();
    }

    /** The id of a point, if it is in the schema. */
    public OptionalInt idOf(Point point) {
        int id = points.indexOf(point);
        return id < 0 ? OptionalInt.empty() : OptionalInt.of(id);
    }

    public Placement placementOf(Mutant mutant) {
        Placement placement = placements.get(mutant.fingerprint());
        if (placement == null) {
            throw new IllegalArgumentException("mutant " + mutant.shortId() + " was not part of this build");
        }
        return placement;
    }
}
