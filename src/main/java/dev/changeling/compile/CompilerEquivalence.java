package dev.changeling.compile;

import dev.changeling.mutant.Mutant;
import dev.changeling.source.SourceFile;
import dev.changeling.source.SourceHash;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.concurrent.ConcurrentHashMap;

/**
 * Trivial compiler equivalence: each mutant's file is compiled on its own without debug information and its classes
 * are compared with the original file's, first byte for byte, then as {@link ClassShape}s. The same as the original:
 * a proposed equivalent. The same as another mutant of the file: a duplicate of it.
 */
public final class CompilerEquivalence {

    /** How a mutant matched the original. */
    public enum Match {
        /** javac wrote the same bytes. */
        BYTES,
        /** The classes differ only where {@link ClassShape} says they do not count. */
        SHAPE
    }

    /**
     * What the comparison found.
     *
     * @param asOriginal  mutants whose classes match the original's, by fingerprint, with how they matched
     * @param duplicates  groups of two or more mutants whose classes match each other's and not the original's, in the
     *                    order given; the first of each group stands for the rest
     * @param uncompiled  mutants (or originals' mutants) that did not compile on their own, so were not compared
     * @param shapes      for each compared mutant whose classes do not match the original's, by fingerprint, a digest of its
     *                    file and its classes' shape: equal digests make the duplicates, here or in another shard of the run
     */
    public record Findings(Map<String, Match> asOriginal, List<List<String>> duplicates, int compared, int uncompiled,
                           Map<String, String> shapes) {

        public static final Findings NONE = new Findings(Map.of(), List.of(), 0, 0, Map.of());
    }

    private CompilerEquivalence() {
    }

    /**
     * Compares every mutant given; {@code classpath} must compile each file on its own. The files are shared out
     * over the cores, each share compiled by its own compiler.
     */
    public static Findings compare(List<Mutant> mutants, Map<String, SourceFile> files, List<Path> classpath) {
        if (mutants.isEmpty()) {
            return Findings.NONE;
        }
        Map<String, Map<String, byte[]>> originals = new ConcurrentHashMap<>();
        Map<String, Map<String, byte[]>> compiled = new ConcurrentHashMap<>();
        shares(mutants, Runtime.getRuntime().availableProcessors()).parallelStream()
                .forEach(share -> compileShare(share, files, classpath, originals, compiled));
        return findings(mutants, originals, compiled);
    }

    /** The mutants in at most {@code count} shares of whole files, the files with the most mutants dealt first. */
    private static List<List<Mutant>> shares(List<Mutant> mutants, int count) {
        Map<String, List<Mutant>> byFile = new LinkedHashMap<>();
        mutants.forEach(mutant -> byFile.computeIfAbsent(mutant.file(), file -> new ArrayList<>()).add(mutant));
        List<List<Mutant>> shares = new ArrayList<>();
        for (int index = 0; index < Math.min(count, byFile.size()); index++) {
            shares.add(new ArrayList<>());
        }
        byFile.values().stream().sorted(Comparator.comparingInt((List<Mutant> file) -> file.size()).reversed())
                .forEach(file -> shares.stream().min(Comparator.comparingInt(List::size)).orElseThrow().addAll(file));
        return shares;
    }

    private static void compileShare(List<Mutant> share, Map<String, SourceFile> files, List<Path> classpath,
                                     Map<String, Map<String, byte[]>> originals, Map<String, Map<String, byte[]>> compiled) {
        try (Javac javac = Javac.withoutDebugInfo(classpath)) {
            Map<String, Map<String, byte[]>> ownOriginals = compileEach(javac, originalsOf(share, files));
            originals.putAll(ownOriginals);
            List<Mutant> pending = share.stream().filter(mutant -> ownOriginals.containsKey(mutant.file())).toList();
            while (!pending.isEmpty()) {
                List<Mutant> batch = AloneCompiler.onePerFile(pending, Mutant::file);
                Map<String, String> sources = new LinkedHashMap<>();
                batch.forEach(mutant -> sources.put(mutant.file(), mutant.apply(files.get(mutant.file()).text())));
                Map<String, Map<String, byte[]>> classes = compileEach(javac, sources);
                batch.stream().filter(mutant -> classes.containsKey(mutant.file()))
                        .forEach(mutant -> compiled.put(mutant.fingerprint(), classes.get(mutant.file())));
                Set<Mutant> done = new HashSet<>(batch);
                pending = pending.stream().filter(mutant -> !done.contains(mutant)).toList();
            }
        }
    }

    private static Findings findings(List<Mutant> mutants, Map<String, Map<String, byte[]>> originals,
                                     Map<String, Map<String, byte[]>> compiled) {
        Map<String, String> originalShapes = new HashMap<>();
        originals.forEach((file, classes) -> originalShapes.put(file, ClassShape.of(classes)));
        Map<String, Match> asOriginal = new LinkedHashMap<>();
        Map<String, List<String>> byShape = new LinkedHashMap<>();
        Map<String, String> shapes = new LinkedHashMap<>();
        for (Mutant mutant : mutants) {
            Map<String, byte[]> classes = compiled.get(mutant.fingerprint());
            if (classes == null) {
                continue;
            }
            if (ClassShape.sameBytes(classes, originals.get(mutant.file()))) {
                asOriginal.put(mutant.fingerprint(), Match.BYTES);
                continue;
            }
            String shape = ClassShape.of(classes);
            if (shape.equals(originalShapes.get(mutant.file()))) {
                asOriginal.put(mutant.fingerprint(), Match.SHAPE);
            } else {
                String digest = SourceHash.sha256(mutant.file() + "\n" + shape);
                shapes.put(mutant.fingerprint(), digest);
                byShape.computeIfAbsent(digest, key -> new ArrayList<>()).add(mutant.fingerprint());
            }
        }
        List<List<String>> duplicates = byShape.values().stream().filter(group -> group.size() > 1).map(List::copyOf).toList();
        return new Findings(asOriginal, duplicates, compiled.size(), mutants.size() - compiled.size(), shapes);
    }

    private static Map<String, String> originalsOf(List<Mutant> mutants, Map<String, SourceFile> files) {
        Map<String, String> originals = new TreeMap<>();
        mutants.forEach(mutant -> originals.put(mutant.file(), files.get(mutant.file()).text()));
        return originals;
    }

    /**
     * Compiles sources of distinct files in one task; when some file has an error javac writes nothing, so the
     * others are compiled again one by one. Files that do not compile are absent from the answer.
     */
    private static Map<String, Map<String, byte[]>> compileEach(Javac javac, Map<String, String> sources) {
        Map<String, Map<String, byte[]>> classes = compileTogether(javac, sources);
        if (classes != null) {
            return classes;
        }
        Map<String, Map<String, byte[]>> each = new HashMap<>();
        if (sources.size() > 1) {
            sources.forEach((path, text) -> {
                Map<String, Map<String, byte[]>> alone = compileTogether(javac, Map.of(path, text));
                if (alone != null) {
                    each.putAll(alone);
                }
            });
        }
        return each;
    }

    /** The classes of every file, or null when any of them has an error. */
    private static Map<String, Map<String, byte[]>> compileTogether(Javac javac, Map<String, String> sources) {
        Map<String, Map<String, byte[]>> classes = new HashMap<>();
        List<Javac.Source> inputs = new ArrayList<>();
        sources.forEach((path, text) -> inputs.add(new Javac.Source(path, text)));
        Javac.Task task = javac.taskInMemory(inputs, (path, className, bytes) ->
                classes.computeIfAbsent(path, key -> new TreeMap<>()).put(className, bytes));
        task.analyze();
        if (!task.errors().isEmpty()) {
            return null;
        }
        task.generate();
        return classes;
    }
}
