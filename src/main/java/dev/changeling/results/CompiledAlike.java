package dev.changeling.results;

import com.fasterxml.jackson.annotation.JsonIgnore;
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
 */
public record CompiledAlike(Map<String, String> asOriginal, List<List<String>> duplicates, int compared) {

    public static final CompiledAlike NONE = new CompiledAlike(Map.of(), List.of(), 0);

    public CompiledAlike {
        asOriginal = asOriginal == null ? Map.of() : Collections.unmodifiableMap(new TreeMap<>(asOriginal));
        duplicates = duplicates == null ? List.of() : duplicates.stream().map(List::copyOf).toList();
    }

    /** How many survivors repeat another one's classes (the first of each group not counted). */
    @JsonIgnore
    public int duplicateCount() {
        return duplicates.stream().mapToInt(group -> group.size() - 1).sum();
    }
}
