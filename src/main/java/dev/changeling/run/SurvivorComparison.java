package dev.changeling.run;

import dev.changeling.compile.CompilerEquivalence;
import dev.changeling.mutant.Mutant;
import dev.changeling.results.CompiledAlike;
import dev.changeling.results.MutantResult;
import dev.changeling.results.Verdict;
import dev.changeling.source.SourceFile;
import dev.changeling.recall.Recall;
import dev.changeling.recall.VerdictKeys;
import java.nio.file.Path;
import java.util.HashMap;
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
     * Compares the survivors whose comparison no earlier run kept under today's key, and keeps what it finds.
     *
     * @param sharded whether the run is a shard of one, whose merge needs each survivor's shape to find duplicates across
     *                shards
     */
    static CompiledAlike compare(List<Mutant> mutants, Map<String, SourceFile> files, Map<String, MutantResult> results,
                                 List<Path> classpath, boolean sharded, Recall recall, VerdictKeys keys) {
        List<Mutant> survivors = mutants.stream()
                .filter(mutant -> results.containsKey(mutant.fingerprint()))
                .filter(mutant -> results.get(mutant.fingerprint()).verdict() == Verdict.SURVIVED)
                .toList();
        Map<String, Recall.KeptComparison> kept = new HashMap<>();
        survivors.forEach(mutant -> recall.comparison(mutant, files.get(mutant.file()), keys)
                .ifPresent(comparison -> kept.put(mutant.fingerprint(), comparison)));
        CompilerEquivalence.Findings findings = CompilerEquivalence.compare(
                survivors.stream().filter(mutant -> !kept.containsKey(mutant.fingerprint())).toList(), files, classpath);
        Map<String, String> asOriginal = new TreeMap<>();
        Map<String, String> shapes = new HashMap<>();
        int compared = findings.compared();
        for (Mutant mutant : survivors) {
            String id = mutant.fingerprint();
            Recall.KeptComparison comparison = kept.get(id);
            if (comparison == null) {
                String match = findings.asOriginal().containsKey(id) ? findings.asOriginal().get(id).name().toLowerCase(Locale.ROOT) : null;
                comparison = new Recall.KeptComparison(null, mutant.file(), match, findings.shapes().get(id));
                recall.keep(mutant, files.get(mutant.file()), match, comparison.shape(), keys);
            } else if (comparison.match() != null || comparison.shape() != null) {
                compared++;
            }
            if (comparison.match() != null) {
                asOriginal.put(id, comparison.match());
            } else if (comparison.shape() != null) {
                shapes.put(id, comparison.shape());
            }
        }
        CompiledAlike alike = CompiledAlike.regrouped(List.of(new CompiledAlike(asOriginal, List.of(), compared, shapes)),
                survivors.stream().map(Mutant::fingerprint).toList());
        return sharded ? new CompiledAlike(alike.asOriginal(), alike.duplicates(), alike.compared(), shapes) : alike;
    }

    /** One line for the run's progress. */
    static String describe(CompiledAlike alike) {
        return "compared: " + alike.compared() + (alike.compared() == 1 ? " survivor" : " survivors")
                + " compiled on their own (or as an earlier run found with the same inputs); " + alike.asOriginal().size() + " compile to the original's classes (proposed equivalent), "
                + alike.duplicateCount() + " repeat another survivor's";
    }
}
