package dev.changeling.run;

import dev.changeling.compile.CompilerEquivalence;
import dev.changeling.mutant.Mutant;
import dev.changeling.results.CompiledAlike;
import dev.changeling.results.MutantResult;
import dev.changeling.results.Verdict;
import dev.changeling.source.SourceFile;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;

/**
 * The run's last phase: every survivor's file compiled on its own and compared with the original's and the other
 * survivors' (trivial compiler equivalence), so that triage can propose equivalents and show duplicates once.
 */
final class SurvivorComparison {

    private SurvivorComparison() {
    }

    /**
     * @param sharded whether the run is a shard of one, whose merge needs each survivor's shape to find duplicates across
     *                shards
     */
    static CompiledAlike compare(List<Mutant> mutants, Map<String, SourceFile> files, Map<String, MutantResult> results,
                                 List<Path> classpath, boolean sharded) {
        List<Mutant> survivors = mutants.stream()
                .filter(mutant -> results.containsKey(mutant.fingerprint()))
                .filter(mutant -> results.get(mutant.fingerprint()).verdict() == Verdict.SURVIVED)
                .toList();
        CompilerEquivalence.Findings findings = CompilerEquivalence.compare(survivors, files, classpath);
        Map<String, String> asOriginal = new TreeMap<>();
        findings.asOriginal().forEach((id, match) -> asOriginal.put(id, match.name().toLowerCase(Locale.ROOT)));
        return new CompiledAlike(asOriginal, findings.duplicates(), findings.compared(),
                sharded ? findings.shapes() : Map.of());
    }

    /** One line for the run's progress. */
    static String describe(CompiledAlike alike) {
        return "compared: " + alike.compared() + (alike.compared() == 1 ? " survivor" : " survivors")
                + " compiled on their own; " + alike.asOriginal().size() + " compile to the original's classes (proposed equivalent), "
                + alike.duplicateCount() + " repeat another survivor's";
    }
}
