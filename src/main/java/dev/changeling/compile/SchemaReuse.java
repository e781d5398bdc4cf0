package dev.changeling.compile;

import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.changeling.AtomicFiles;
import dev.changeling.ToolBuild;
import dev.changeling.mutant.EntryMethods.EntryMethod;
import dev.changeling.mutant.Point;
import dev.changeling.source.SourceFile;
import dev.changeling.source.SourceHash;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;

/**
 * The last schema build, kept beside its classes (with the methods whose entry it notes) under the key of everything it
 * was compiled from: the points, the text of their files, the classpath by content, this tool's build and the Java runtime. A run whose key is the same
 * takes the classes and the rounds' outcome as they are, provided the classes are still the ones written (their digest
 * is kept too); anything else compiles again.
 */
final class SchemaReuse {

    static final String FILE_NAME = "schema-outcome.json";

    private static final ObjectMapper JSON = new ObjectMapper().disable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES);

    /** The outcome as kept, points by fingerprint. */
    record Kept(String key, String classes, List<String> points, Map<String, String> evicted, Map<String, String> stillborn,
                List<String> classNames, List<String> watched, int rounds, List<EntryMethod> entries) {
    }

    private SchemaReuse() {
    }

    /** The key of a schema build: equal keys, equal build. */
    static String key(Set<Point> candidates, Map<String, SourceFile> files, List<Path> classpath) {
        StringBuilder text = new StringBuilder("tool ").append(ToolBuild.identity()).append("\njava ")
                .append(System.getProperty("java.version")).append('\n');
        candidates.stream().map(Point::fingerprint).sorted().forEach(point -> text.append("point ").append(point).append('\n'));
        candidates.stream().map(Point::file).collect(Collectors.toCollection(TreeSet::new))
                .forEach(file -> text.append("file ").append(file).append(' ').append(SourceHash.sha256(files.get(file).text())).append('\n'));
        classpath.forEach(entry -> text.append("classpath ").append(entry).append(' ').append(SourceHash.ofEntry(entry, path -> true)).append('\n'));
        return SourceHash.sha256(text.toString());
    }

    /** The kept outcome, when its key is {@code key} and the schema's classes in {@code output} are those it wrote. */
    static Optional<SchemaCompiler.Outcome> reuse(Path output, String key, Set<Point> candidates) {
        Path file = output.resolve(FILE_NAME);
        if (!Files.isRegularFile(file)) {
            return Optional.empty();
        }
        try {
            Kept kept = JSON.readValue(file.toFile(), Kept.class);
            if (!key.equals(kept.key()) || !kept.classes().equals(SourceHash.ofEntry(output.resolve(MutantBuild.SCHEMA), path -> true))) {
                return Optional.empty();
            }
            Map<String, Point> byFingerprint = new HashMap<>();
            candidates.forEach(point -> byFingerprint.put(point.fingerprint(), point));
            return Optional.of(new SchemaCompiler.Outcome(kept.points().stream().map(byFingerprint::get).toList(),
                    points(kept.evicted(), byFingerprint), points(kept.stillborn(), byFingerprint), Set.copyOf(kept.classNames()),
                    0, 0, 0, kept.watched().stream().map(byFingerprint::get).collect(Collectors.toUnmodifiableSet()),
                    List.copyOf(kept.entries())));
        } catch (IOException | RuntimeException e) {
            return Optional.empty();
        }
    }

    /** Keeps a fresh outcome for the next run; a failure to write only means the next run compiles again. */
    static void keep(Path output, String key, SchemaCompiler.Outcome outcome) {
        Kept kept = new Kept(key, SourceHash.ofEntry(output.resolve(MutantBuild.SCHEMA), path -> true), outcome.points().stream().map(Point::fingerprint).toList(),
                fingerprints(outcome.evicted()), fingerprints(outcome.stillborn()), List.copyOf(new TreeSet<>(outcome.classNames())),
                outcome.watched().stream().map(Point::fingerprint).sorted().toList(), outcome.rounds(), outcome.entries());
        try {
            AtomicFiles.write(output.resolve(FILE_NAME), out -> JSON.writeValue(out, kept));
        } catch (IOException | RuntimeException e) {
            // the next run compiles again
        }
    }

    private static Map<Point, String> points(Map<String, String> byFingerprint, Map<String, Point> points) {
        Map<Point, String> result = new LinkedHashMap<>();
        byFingerprint.forEach((fingerprint, text) -> result.put(points.get(fingerprint), text));
        return result;
    }

    private static Map<String, String> fingerprints(Map<Point, String> byPoint) {
        Map<String, String> result = new LinkedHashMap<>();
        byPoint.forEach((point, text) -> result.put(point.fingerprint(), text));
        return result;
    }
}
