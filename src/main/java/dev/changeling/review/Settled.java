package dev.changeling.review;

import dev.changeling.results.MutantResult;
import java.nio.file.Path;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;

/**
 * What triage has settled in a project: the committed equivalents list and the mutants marked fixed
 * locally. Every view that leaves settled survivors out asks here.
 *
 * @param equivalent fingerprints on the equivalents list
 * @param fixed      fingerprints marked fixed (checked by a re-run when they were marked)
 */
public record Settled(Set<String> equivalent, Set<String> fixed) {

    public Settled {
        equivalent = Set.copyOf(equivalent);
        fixed = Set.copyOf(fixed);
    }

    public static Settled load(Path projectRoot) {
        Set<String> equivalent = EquivalentsList.load(projectRoot).entries().stream()
                .map(EquivalentEntry::fingerprint).collect(Collectors.toSet());
        Set<String> fixed = TriageMarks.open(projectRoot).all().entrySet().stream()
                .filter(entry -> entry.getValue().kind() == TriageMarks.Kind.FIXED)
                .map(Map.Entry::getKey).collect(Collectors.toSet());
        return new Settled(equivalent, fixed);
    }

    /** Listed as equivalent or marked fixed: no longer a survivor to look at. */
    public boolean resolved(MutantResult mutant) {
        return equivalent.contains(mutant.id()) || fixed.contains(mutant.id());
    }
}
