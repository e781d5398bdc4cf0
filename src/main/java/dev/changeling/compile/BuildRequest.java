package dev.changeling.compile;

import dev.changeling.mutant.EntryMethods.EntryMethod;
import dev.changeling.mutant.Mutant;
import dev.changeling.mutant.Point;
import dev.changeling.source.SourceFile;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

/**
 * What to compile: the mutants to run, the original files they were made from, the compile
 * classpath and where the classes go.
 *
 * @param mutants         first-order and k-order mutants, each within one file
 * @param files           the original files by project-relative path; every mutant's file must be here
 * @param classpath       the project's own classes, its dependency jars and a folder holding
 *                        {@code dev.changeling.probe.Probe}
 * @param outputDirectory a folder of the tool's own (below {@code target/changeling/}); its
 *                        {@code schema}, {@code schema-sources} and {@code alone} subfolders are replaced
 * @param entryMethods    the methods whose entry the schema notes, of the files whose methods are known already (from
 *                        their trees); the others' are found by parsing them
 */
public record BuildRequest(List<Mutant> mutants, Map<String, SourceFile> files, List<Path> classpath,
                           Path outputDirectory, Map<String, List<EntryMethod>> entryMethods) {

    /** A request whose files' methods are found by parsing them. */
    public BuildRequest(List<Mutant> mutants, Map<String, SourceFile> files, List<Path> classpath, Path outputDirectory) {
        this(mutants, files, classpath, outputDirectory, Map.of());
    }

    public BuildRequest {
        mutants = List.copyOf(mutants);
        files = Map.copyOf(files);
        entryMethods = Map.copyOf(entryMethods);
        classpath = List.copyOf(classpath);
        for (Mutant mutant : mutants) {
            SourceFile file = files.get(mutant.file());
            if (file == null) {
                throw new IllegalArgumentException("mutant " + mutant.shortId() + " belongs to " + mutant.file()
                        + ", which is not among the files given");
            }
            for (Point point : mutant.points()) {
                if (!point.file().equals(mutant.file()) || point.host().end() > file.text().length()
                        || !point.host().contains(point.edit())) {
                    throw new IllegalArgumentException("mutant " + mutant.shortId() + " has a change that does not fit "
                            + mutant.file() + ": " + point.host() + " / " + point.edit() + " in " + point.file());
                }
            }
        }
    }
}
