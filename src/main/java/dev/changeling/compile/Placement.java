package dev.changeling.compile;

import java.nio.file.Path;
import java.util.List;
import java.util.Objects;

/**
 * Where one mutant ended up after the build, and so how a worker runs it.
 *
 * @param kind     which of the four it is
 * @param pointIds for {@link Kind#IN_SCHEMA}: the schema points to switch on together; empty otherwise
 * @param classes  for {@link Kind#ALONE}: the folder with the mutant's own classes; null otherwise
 * @param detail   why it left the schema (alone), javac's first error as {@code file:line: message}
 *                 (stillborn), or why it was left out (once per JVM); empty for in-schema mutants
 */
public record Placement(Kind kind, List<Integer> pointIds, Path classes, String detail) {

    /** The four places a mutant can end up. */
    public enum Kind {
        /** Compiled into the shared schema classes; switched on by point ids. */
        IN_SCHEMA,
        /** Compiled on its own; its folder goes first on a fresh worker's classpath. */
        ALONE,
        /** Does not compile; not run and not counted. */
        STILLBORN,
        /** Lives in code that runs once per JVM, where switching cannot reach it; not run, reported as skipped. */
        ONCE_PER_JVM
    }

    public Placement {
        Objects.requireNonNull(kind, "kind");
        pointIds = List.copyOf(pointIds);
        detail = detail == null ? "" : detail;
    }

    static Placement inSchema(List<Integer> pointIds) {
        return new Placement(Kind.IN_SCHEMA, pointIds, null, "");
    }

    static Placement alone(Path classes, String reason) {
        return new Placement(Kind.ALONE, List.of(), classes, reason);
    }

    static Placement stillborn(String firstError) {
        return new Placement(Kind.STILLBORN, List.of(), null, firstError);
    }

    static Placement oncePerJvm(String reason) {
        return new Placement(Kind.ONCE_PER_JVM, List.of(), null, reason);
    }

    /** The point ids as {@code Probe.activate} takes them. */
    public int[] activation() {
        return pointIds.stream().mapToInt(Integer::intValue).toArray();
    }
}
