package dev.changeling.compile;

import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.changeling.AtomicFiles;
import dev.changeling.ToolBuild;
import dev.changeling.mutant.EntryMethods;
import dev.changeling.mutant.EntryMethods.EntryMethod;
import dev.changeling.mutant.Point;
import dev.changeling.source.SourceFile;
import dev.changeling.source.SourceHash;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Collection;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.function.Predicate;
import java.util.stream.Collectors;

/**
 * The last schema build, kept beside its classes (with the methods whose entry it notes) under the key of everything it
 * was compiled from: the points, the text of their files, the classpath by content (less the classes of the files with
 * points, which javac compiles from their text), this tool's build and the Java runtime. A run whose key is the same
 * takes the classes and the rounds' outcome as they are, provided the classes are still the ones written (their digest
 * is kept too); anything else compiles again. When only method bodies changed
 * (every changed file's text without them is as it was), the points that left the schema last time from the files that
 * did not change leave it again at once, for the same reasons: javac reads other files' signatures, never their bodies,
 * so their rounds would find the same errors; the schema then usually compiles in one round.
 */
final class SchemaReuse {

    static final String FILE_NAME = "schema-outcome.json";

    private static final ObjectMapper JSON = new ObjectMapper().disable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES);

    /**
     * One file of a build as kept: digests of its text, of its points, and of its text without the bodies of the
     * methods whose entry is noted.
     */
    record FileState(String text, String points, String skeleton) {
    }

    /** What a build is compiled from: the tool, Java and classpath as one digest, and each file with points. */
    record Inputs(String base, Map<String, FileState> files) {

        /** Equal keys, equal build. */
        String key() {
            StringBuilder text = new StringBuilder(base).append('\n');
            files.forEach((path, state) -> text.append(path).append(' ').append(state).append('\n'));
            return SourceHash.sha256(text.toString());
        }
    }

    /** The outcome as kept, points by fingerprint. */
    record Kept(String key, String classes, List<String> points, Map<String, String> evicted, Map<String, String> stillborn,
                List<String> classNames, List<String> watched, int rounds, List<EntryMethod> entries, String base,
                Map<String, FileState> files) {
    }

    /** Points that leave the schema before its first round, each with the reason it left last time. */
    record Carried(Map<Point, String> evicted, Map<Point, String> stillborn) {

        static final Carried NONE = new Carried(Map.of(), Map.of());
    }

    private SchemaReuse() {
    }

    static Inputs inputs(Set<Point> candidates, Map<String, SourceFile> files, Map<String, List<EntryMethod>> methods,
                         List<Path> classpath) {
        StringBuilder base = new StringBuilder("tool ").append(ToolBuild.identity()).append("\njava ")
                .append(System.getProperty("java.version")).append('\n');
        Map<String, TreeSet<String>> pointsByFile = new TreeMap<>();
        candidates.forEach(point -> pointsByFile.computeIfAbsent(point.file(), path -> new TreeSet<>()).add(point.fingerprint()));
        Predicate<String> compiledFromSource = compiledFrom(pointsByFile.keySet());
        classpath.forEach(entry -> base.append("classpath ").append(entry).append(' ')
                .append(SourceHash.ofEntry(entry, compiledFromSource.negate())).append('\n'));
        Map<String, FileState> states = new TreeMap<>();
        pointsByFile.forEach((path, points) -> {
            SourceFile file = files.get(path);
            states.put(path, new FileState(SourceHash.sha256(file.text()), SourceHash.sha256(String.join("\n", points)),
                    SourceHash.sha256(EntryMethods.skeleton(file, methods.getOrDefault(path, List.of())))));
        });
        return new Inputs(SourceHash.sha256(base.toString()), states);
    }

    /**
     * Whether a class file of a classpath folder ({@code a/b/Zone$Row.class}) is that of a file with points
     * ({@code …/a/b/Zone.java}): javac compiles those from their sources, so their classes on the classpath do not count.
     */
    private static Predicate<String> compiledFrom(Set<String> sources) {
        Set<String> endings = new HashSet<>();
        for (String source : sources) {
            for (int slash = source.indexOf('/'); slash >= 0; slash = source.indexOf('/', slash + 1)) {
                endings.add(source.substring(slash + 1));
            }
            endings.add(source);
        }
        return name -> {
            if (!name.endsWith(".class")) {
                return false;
            }
            int nested = name.indexOf('$', name.lastIndexOf('/') + 1);
            return endings.contains(name.substring(0, nested >= 0 ? nested : name.length() - ".class".length()) + ".java");
        };
    }

    /**
     * The kept outcome ({@link #read}), when its key is that of {@code inputs} and the schema's classes in {@code output}
     * are those it wrote.
     */
    static Optional<SchemaCompiler.Outcome> reuse(Optional<Kept> last, Path output, Inputs inputs, Set<Point> candidates) {
        return last.filter(kept -> inputs.key().equals(kept.key())
                        && kept.classes().equals(SourceHash.ofEntry(output.resolve(MutantBuild.SCHEMA), path -> true)))
                .map(kept -> {
                    Map<String, Point> byFingerprint = byFingerprint(candidates);
                    return new SchemaCompiler.Outcome(kept.points().stream().map(byFingerprint::get).toList(),
                            points(kept.evicted(), byFingerprint), points(kept.stillborn(), byFingerprint), Set.copyOf(kept.classNames()),
                            0, 0, 0, kept.watched().stream().map(byFingerprint::get).collect(Collectors.toUnmodifiableSet()),
                            List.copyOf(kept.entries()));
                });
    }

    /**
     * The points of unchanged files that left the last build's schema, when the build differs from this one only in
     * method bodies: the same tool, Java, classpath and files, and every changed file the same without its methods'
     * bodies. Otherwise none. An unchanged file is one with the same text and the same points.
     */
    static Carried carried(Optional<Kept> last, Inputs inputs, Set<Point> candidates) {
        Kept kept = last.orElse(null);
        if (kept == null || kept.files() == null || !inputs.base().equals(kept.base()) || !inputs.files().keySet().equals(kept.files().keySet())) {
            return Carried.NONE;
        }
        Set<String> unchanged = new TreeSet<>();
        for (Map.Entry<String, FileState> file : inputs.files().entrySet()) {
            FileState before = kept.files().get(file.getKey());
            if (!before.skeleton().equals(file.getValue().skeleton())) {
                return Carried.NONE;
            }
            if (before.text().equals(file.getValue().text()) && before.points().equals(file.getValue().points())) {
                unchanged.add(file.getKey());
            }
        }
        Map<String, Point> inUnchangedFiles = byFingerprint(candidates.stream().filter(point -> unchanged.contains(point.file())).toList());
        return new Carried(points(kept.evicted(), inUnchangedFiles), points(kept.stillborn(), inUnchangedFiles));
    }

    /** Keeps a fresh outcome for the next run; a failure to write only means the next run compiles again. */
    static void keep(Path output, Inputs inputs, SchemaCompiler.Outcome outcome) {
        Kept kept = new Kept(inputs.key(), SourceHash.ofEntry(output.resolve(MutantBuild.SCHEMA), path -> true),
                outcome.points().stream().map(Point::fingerprint).toList(), fingerprints(outcome.evicted()),
                fingerprints(outcome.stillborn()), List.copyOf(new TreeSet<>(outcome.classNames())),
                outcome.watched().stream().map(Point::fingerprint).sorted().toList(), outcome.rounds(), outcome.entries(),
                inputs.base(), inputs.files());
        try {
            AtomicFiles.write(output.resolve(FILE_NAME), out -> JSON.writeValue(out, kept));
        } catch (IOException | RuntimeException e) {
            // the next run compiles again
        }
    }

    /** The last build's outcome as kept in {@code output}, if there is one that reads whole. */
    static Optional<Kept> read(Path output) {
        Path file = output.resolve(FILE_NAME);
        if (!Files.isRegularFile(file)) {
            return Optional.empty();
        }
        try {
            Kept kept = JSON.readValue(file.toFile(), Kept.class);
            return kept.key() == null || kept.classes() == null || kept.points() == null || kept.evicted() == null || kept.stillborn() == null || kept.classNames() == null
                    || kept.watched() == null || kept.entries() == null ? Optional.empty() : Optional.of(kept);
        } catch (IOException | RuntimeException e) {
            return Optional.empty();
        }
    }

    private static Map<String, Point> byFingerprint(Collection<Point> points) {
        Map<String, Point> result = new HashMap<>();
        points.forEach(point -> result.put(point.fingerprint(), point));
        return result;
    }

    /** The points named, in the order named; those not among {@code points} are left out. */
    private static Map<Point, String> points(Map<String, String> byFingerprint, Map<String, Point> points) {
        Map<Point, String> result = new LinkedHashMap<>();
        byFingerprint.forEach((fingerprint, text) -> {
            Point point = points.get(fingerprint);
            if (point != null) {
                result.put(point, text);
            }
        });
        return result;
    }

    private static Map<String, String> fingerprints(Map<Point, String> byPoint) {
        Map<String, String> result = new LinkedHashMap<>();
        byPoint.forEach((point, text) -> result.put(point.fingerprint(), text));
        return result;
    }
}
