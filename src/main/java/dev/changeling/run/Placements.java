package dev.changeling.run;

import dev.changeling.compile.BuildResult;
import dev.changeling.compile.Placement;
import dev.changeling.mutant.Mutant;
import dev.changeling.results.MutantResult;
import dev.changeling.results.Records;
import dev.changeling.results.Verdict;
import dev.changeling.source.SourceFile;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * What compiling decided for each mutant: those that need no test (stillborn, or in code that runs once per
 * JVM) have their verdict now; the rest go on to run.
 *
 * @param settled  verdicts known without running a test, by fingerprint
 * @param runnable mutants to run, in the order chosen
 */
record Placements(Map<String, MutantResult> settled, List<Mutant> runnable) {

    static Placements of(List<Mutant> mutants, BuildResult build, Map<String, SourceFile> files) {
        Map<String, MutantResult> settled = new LinkedHashMap<>();
        List<Mutant> runnable = new ArrayList<>();
        for (Mutant mutant : mutants) {
            Placement placement = build.placementOf(mutant);
            SourceFile file = files.get(mutant.file());
            switch (placement.kind()) {
                case STILLBORN -> settled.put(mutant.fingerprint(), Records.of(mutant, file, Verdict.STILLBORN, placement.detail()));
                case ONCE_PER_JVM -> settled.put(mutant.fingerprint(), Records.of(mutant, file, Verdict.SKIPPED, placement.detail()));
                default -> runnable.add(mutant);
            }
        }
        return new Placements(settled, runnable);
    }

    long count(Verdict verdict) {
        return settled.values().stream().filter(result -> result.verdict() == verdict).count();
    }
}
