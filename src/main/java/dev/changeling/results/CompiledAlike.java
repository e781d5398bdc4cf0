package dev.changeling.results;

import com.fasterxml.jackson.annotation.JsonIgnore;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

/**
 * What compiling each survivor on its own told (trivial compiler equivalence): survivors whose classes are the
 * original's, proposed as equivalent until a person accepts, and groups of survivors whose classes are each other's.
 *
 * @param asOriginal survivors compiling to the original's classes, by id: {@code bytes} when javac wrote the same
 *                   bytes, {@code shape} when they differ only where Changeling's normalisation says it does not count
 * @param duplicates groups of two or more survivors of one file with the same classes; the first stands for the rest
 * @param compared   how many survivors were compiled and compared
 */
public record CompiledAlike(Map<String, String> asOriginal, List<List<String>> duplicates, int compared) {

    public static final CompiledAlike NONE = new CompiledAlike(Map.of(), List.of(), 0);

    public CompiledAlike {
        asOriginal = asOriginal == null ? Map.of() : new TreeMap<>(asOriginal);
        duplicates = duplicates == null ? List.of() : duplicates.stream().map(List::copyOf).toList();
    }

    /** How a survivor matched the original, if it did. */
    public Optional<String> asOriginal(String id) {
        return Optional.ofNullable(asOriginal.get(id));
    }

    /** The survivor that stands for this one's group, if this one is a duplicate and not the first. */
    public Optional<String> duplicateOf(String id) {
        return Optional.ofNullable(standsFor().get(id));
    }

    /** The other members of the group that {@code id} stands for; empty when it stands for none. */
    public List<String> duplicatesOf(String id) {
        return duplicates.stream().filter(group -> group.get(0).equals(id)).findFirst()
                .map(group -> group.subList(1, group.size())).orElse(List.of());
    }

    /** How many survivors repeat another one's classes (the first of each group not counted). */
    @JsonIgnore
    public int duplicateCount() {
        return duplicates.stream().mapToInt(group -> group.size() - 1).sum();
    }

    private Map<String, String> standsFor() {
        Map<String, String> first = new HashMap<>();
        duplicates.forEach(group -> group.subList(1, group.size()).forEach(id -> first.put(id, group.get(0))));
        return first;
    }
}
