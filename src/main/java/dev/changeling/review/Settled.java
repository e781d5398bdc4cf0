package dev.changeling.review;

import dev.changeling.project.ProjectLayout;
import dev.changeling.results.MutantResult;
import dev.changeling.results.ResultsFile;
import java.nio.file.Path;
import java.time.Instant;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;

/**
 * What triage has settled in a project: the committed equivalents list and the mutants marked fixed
 * locally. Every view that leaves settled survivors out asks here.
 *
 * @param equivalent     fingerprints on the equivalents list
 * @param fixed          the fixed marks, by fingerprint (each checked by a re-run when it was made)
 * @param resultsWritten when the results in view were written; a fixed mark older than them stands only if they
 *                       do not find its mutant surviving ({@link TriageMarks.Mark#standsFor})
 */
public record Settled(Set<String> equivalent, Map<String, TriageMarks.Mark> fixed, Instant resultsWritten) {

    public Settled {
        equivalent = Set.copyOf(equivalent);
        fixed = Map.copyOf(fixed);
    }

    /** What is settled in the project, held against its results file as it is now. */
    public static Settled load(Path projectRoot) {
        Set<String> equivalent = EquivalentsList.load(projectRoot).entries().stream()
                .map(EquivalentEntry::fingerprint).collect(Collectors.toSet());
        Map<String, TriageMarks.Mark> fixed = TriageMarks.open(projectRoot).all().entrySet().stream()
                .filter(entry -> entry.getValue().kind() == TriageMarks.Kind.FIXED)
                .collect(Collectors.toMap(Map.Entry::getKey, Map.Entry::getValue));
        return new Settled(equivalent, fixed, resultsWritten(projectRoot));
    }

    /** When the project's results file was written: what a fixed mark is held against. */
    public static Instant resultsWritten(Path projectRoot) {
        return ResultsFile.writtenAt(ProjectLayout.of(projectRoot).resultsFile());
    }

    /** Listed as equivalent, or marked fixed by a mark that still stands: no longer a survivor to look at. */
    public boolean resolved(MutantResult mutant) {
        TriageMarks.Mark mark = fixed.get(mutant.id());
        return equivalent.contains(mutant.id()) || (mark != null && mark.standsFor(mutant, resultsWritten));
    }
}
