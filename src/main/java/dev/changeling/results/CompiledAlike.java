package dev.changeling.results;

import com.fasterxml.jackson.annotation.JsonIgnore;
import com.fasterxml.jackson.annotation.JsonInclude;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * What compiling each survivor on its own told (trivial compiler equivalence): survivors whose classes are the
 * original's, proposed as equivalent until a person accepts, and groups of survivors whose classes are each other's.
 *
 * @param asOriginal survivors compiling to the original's classes, by id: {@code bytes} when javac wrote the same
 *                   bytes, {@code shape} when they differ only where Changeling's normalisation says it does not count
 * @param duplicates groups of two or more survivors of one file with the same classes; the first stands for the rest
 * @param compared   how many survivors were compiled and compared
 * @param shapes     in a shard of a run only: for each compared survivor whose classes are not the original's, by id, a
 *                   digest of its file and its classes, so that merging the shards finds the duplicates one run would
 *                   have found across them ({@link #regrouped}); empty otherwise
 */
public record CompiledAlike(Map<String, String> asOriginal, List<List<String>> duplicates, int compared,
                            @JsonInclude(JsonInclude.Include.NON_EMPTY) Map<String, String> shapes) {

    public static final CompiledAlike NONE = new CompiledAlike(Map.of(), List.of(), 0);

    public CompiledAlike {
        asOriginal = asOriginal == null ? Map.of() : Collections.unmodifiableMap(new TreeMap<>(asOriginal));
        duplicates = duplicates == null ? List.of() : duplicates.stream().map(List::copyOf).toList();
        shapes = shapes == null ? Map.of() : Collections.unmodifiableMap(new TreeMap<>(shapes));
    }

    /** What a whole run keeps: no shapes. */
    public CompiledAlike(Map<String, String> asOriginal, List<List<String>> duplicates, int compared) {
        this(asOriginal, duplicates, compared, Map.of());
    }

    /**
     * What one run over all of {@code order} would have found, from the findings of its shards: the proposed equivalents
     * of each, and the duplicates found again from the shapes, grouped as a whole run groups them (in the run's order of
     * mutants, each group in that order, the groups by their first member).
     */
    public static CompiledAlike regrouped(List<CompiledAlike> shards, List<String> order) {
        Map<String, String> asOriginal = new TreeMap<>();
        Map<String, String> shapes = new HashMap<>();
        int compared = 0;
        for (CompiledAlike shard : shards) {
            asOriginal.putAll(shard.asOriginal);
            shapes.putAll(shard.shapes);
            compared += shard.compared;
        }
        Map<String, List<String>> byShape = new LinkedHashMap<>();
        order.stream().filter(shapes::containsKey)
                .forEach(id -> byShape.computeIfAbsent(shapes.get(id), shape -> new ArrayList<>()).add(id));
        List<List<String>> duplicates = byShape.values().stream().filter(group -> group.size() > 1).toList();
        return new CompiledAlike(asOriginal, duplicates, compared);
    }

    /** What both comparisons found, as for one run: those of two modules of a build, whose survivors are apart. */
    public CompiledAlike plus(CompiledAlike other) {
        Map<String, String> both = new TreeMap<>(asOriginal);
        both.putAll(other.asOriginal);
        List<List<String>> groups = new ArrayList<>(duplicates);
        groups.addAll(other.duplicates);
        Map<String, String> allShapes = new HashMap<>(shapes);
        allShapes.putAll(other.shapes);
        return new CompiledAlike(both, groups, compared + other.compared, allShapes);
    }

    /** How many survivors repeat another one's classes (the first of each group not counted). */
    @JsonIgnore
    public int duplicateCount() {
        return duplicates.stream().mapToInt(group -> group.size() - 1).sum();
    }
}
