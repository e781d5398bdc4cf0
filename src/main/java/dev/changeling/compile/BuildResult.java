package dev.changeling.compile;

import dev.changeling.mutant.Mutant;
import dev.changeling.mutant.Point;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.OptionalInt;

/**
 * What a build produced: the schema's points by id, where every mutant ended up, the schema
 * classes and the time it took.
 *
 * @param points           the schema's points; a point's id is its index (dense from 0)
 * @param placements       per mutant fingerprint, where the mutant ended up
 * @param schemaClasses    the folder of schema classes, to go first on a worker's classpath
 * @param schemaClassNames the binary names of every class compiled into it, sorted
 * @param timings          where the time went
 */
public record BuildResult(List<Point> points, Map<String, Placement> placements, Path schemaClasses,
                          List<String> schemaClassNames, BuildTimings timings) {

    public BuildResult {
        points = List.copyOf(points);
        placements = Map.copyOf(placements);
        schemaClassNames = List.copyOf(schemaClassNames);
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
