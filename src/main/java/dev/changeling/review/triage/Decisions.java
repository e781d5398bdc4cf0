package dev.changeling.review.triage;

import dev.changeling.results.MutantResult;
import dev.changeling.review.EquivalentEntry;
import dev.changeling.review.EquivalentsList;
import dev.changeling.review.Settled;
import dev.changeling.review.TriageMarks;
import java.nio.file.Path;
import java.time.Instant;
import java.util.Optional;

/**
 * The decisions of a project: equivalents in the committed list, the rest in the local marks. Each
 * change reads the file afresh and writes it at once, so a long session does not write over edits
 * made meanwhile, and one decision per survivor holds (a new one replaces the old wherever it was).
 */
final class Decisions {

    private final Path projectRoot;
    private final Instant resultsWritten;
    private EquivalentsList equivalents;
    private TriageMarks marks;

    private Decisions(Path projectRoot, Instant resultsWritten, EquivalentsList equivalents, TriageMarks marks) {
        this.projectRoot = projectRoot;
        this.resultsWritten = resultsWritten;
        this.equivalents = equivalents;
        this.marks = marks;
    }

    /** The decisions, held against the project's results file as it is now (a fixed mark a later run contradicts lapses). */
    static Decisions load(Path projectRoot) {
        return new Decisions(projectRoot, Settled.resultsWritten(projectRoot),
                EquivalentsList.load(projectRoot), TriageMarks.open(projectRoot));
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
        list.put(EquivalentEntry.of(mutant, reason));
        list.save();
        equivalents = list;
        TriageMarks fresh = TriageMarks.open(projectRoot);
        fresh.clear(mutant.id());
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
        if (listed.isPresent()) {
            list.save();
        }
        equivalents = list;
        TriageMarks fresh = TriageMarks.open(projectRoot);
        Optional<TriageMarks.Mark> marked = fresh.get(mutant.id());
        fresh.clear(mutant.id());
        marks = fresh;
        return listed.map(entry -> new Decision(Decision.Kind.EQUIVALENT, entry.reason())).or(() -> marked.map(Decisions::of));
    }

    private void mark(MutantResult mutant, TriageMarks.Kind kind, String note) {
        TriageMarks fresh = TriageMarks.open(projectRoot);
        fresh.mark(mutant.id(), kind, note);
        marks = fresh;
        EquivalentsList list = EquivalentsList.load(projectRoot);
        if (list.remove(mutant.id()).isPresent()) {
            list.save();
        }
        equivalents = list;
    }
}
