package dev.changeling.review.triage;

import dev.changeling.results.MutantResult;
import dev.changeling.review.EquivalentEntry;
import dev.changeling.review.EquivalentsList;
import dev.changeling.review.Settled;
import dev.changeling.review.TriageMarks;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Function;

/**
 * The decisions of a project: equivalents in the committed list, the rest in the local marks. Each
 * change reads the file afresh and writes it at once, so a long session does not write over edits
 * made meanwhile, and one decision per survivor holds (a new one replaces the old wherever it was). A survivor that
 * stands for duplicates (others compiling to its very classes) decides for them too.
 */
final class Decisions {

    private final Path projectRoot;
    private final Instant resultsWritten;
    private final Function<MutantResult, List<MutantResult>> duplicates;
    private EquivalentsList equivalents;
    private TriageMarks marks;

    private Decisions(Path projectRoot, Instant resultsWritten, Function<MutantResult, List<MutantResult>> duplicates,
                      EquivalentsList equivalents, TriageMarks marks) {
        this.projectRoot = projectRoot;
        this.resultsWritten = resultsWritten;
        this.duplicates = duplicates;
        this.equivalents = equivalents;
        this.marks = marks;
    }

    /**
     * The decisions, held against the project's results file as it is now (a fixed mark a later run contradicts
     * lapses); {@code duplicates} gives the survivors a survivor stands for.
     */
    static Decisions load(Path projectRoot, Function<MutantResult, List<MutantResult>> duplicates) {
        return new Decisions(projectRoot, Settled.resultsWritten(projectRoot), duplicates,
                EquivalentsList.load(projectRoot), TriageMarks.open(projectRoot));
    }

    /** The survivor and those it stands for. */
    private List<MutantResult> group(MutantResult mutant) {
        List<MutantResult> group = new ArrayList<>();
        group.add(mutant);
        group.addAll(duplicates.apply(mutant));
        return group;
    }

    Optional<Decision> of(MutantResult mutant) {
        Optional<EquivalentEntry> entry = equivalents.find(mutant.id());
        if (entry.isPresent()) {
            return Optional.of(new Decision(Decision.Kind.EQUIVALENT, entry.get().reason()));
        }
        return marks.get(mutant.id()).filter(mark -> mark.standsFor(mutant, resultsWritten)).map(Decisions::of);
    }

    /** Why a fixed mark of this survivor no longer stands, if it has lapsed. */
    Optional<String> lapse(MutantResult mutant) {
        return marks.get(mutant.id()).filter(mark -> !mark.standsFor(mutant, resultsWritten)).map(TriageMarks.Mark::lapse);
    }

    private static Decision of(TriageMarks.Mark mark) {
        return new Decision(mark.kind() == TriageMarks.Kind.FIXED ? Decision.Kind.FIXED : Decision.Kind.NEEDS_TEST, mark.note());
    }

    boolean decided(MutantResult mutant) {
        return of(mutant).isPresent();
    }

    /** Whether triage has settled it: listed as equivalent or marked fixed. */
    boolean resolved(MutantResult mutant) {
        return of(mutant).map(decision -> decision.kind().resolves()).orElse(false);
    }

    void equivalent(MutantResult mutant, String reason) {
        EquivalentsList list = EquivalentsList.load(projectRoot);
        group(mutant).forEach(member -> list.put(EquivalentEntry.of(member, reason)));
        list.save();
        equivalents = list;
        TriageMarks fresh = TriageMarks.open(projectRoot);
        group(mutant).forEach(member -> fresh.clear(member.id()));
        marks = fresh;
    }

    void needsTest(MutantResult mutant, String note) {
        mark(mutant, TriageMarks.Kind.NEEDS_TEST, note);
    }

    void fixed(MutantResult mutant, String note) {
        mark(mutant, TriageMarks.Kind.FIXED, note);
    }

    /**
     * Takes away the decision about a mutant wherever it is kept (its entry in the list, or its local mark), each
     * file read afresh and written at once; every other entry and mark stays. Returns the decision taken away.
     */
    Optional<Decision> clear(MutantResult mutant) {
        EquivalentsList list = EquivalentsList.load(projectRoot);
        Optional<EquivalentEntry> listed = list.remove(mutant.id());
        boolean removed = listed.isPresent();
        for (MutantResult duplicate : duplicates.apply(mutant)) {
            removed |= list.remove(duplicate.id()).isPresent();
        }
        if (removed) {
            list.save();
        }
        equivalents = list;
        TriageMarks fresh = TriageMarks.open(projectRoot);
        Optional<TriageMarks.Mark> marked = fresh.get(mutant.id());
        group(mutant).forEach(member -> fresh.clear(member.id()));
        marks = fresh;
        return listed.map(entry -> new Decision(Decision.Kind.EQUIVALENT, entry.reason())).or(() -> marked.map(Decisions::of));
    }

    private void mark(MutantResult mutant, TriageMarks.Kind kind, String note) {
        TriageMarks fresh = TriageMarks.open(projectRoot);
        group(mutant).forEach(member -> fresh.mark(member.id(), kind, note));
        marks = fresh;
        EquivalentsList list = EquivalentsList.load(projectRoot);
        boolean removed = false;
        for (MutantResult member : group(mutant)) {
            removed |= list.remove(member.id()).isPresent();
        }
        if (removed) {
            list.save();
        }
        equivalents = list;
    }
}
