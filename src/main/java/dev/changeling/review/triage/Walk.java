package dev.changeling.review.triage;

import dev.changeling.results.MutantResult;
import java.util.List;
import java.util.Optional;
import java.util.function.Predicate;

/**
 * Where triage is in its list of survivors. Going on stops only at survivors without a decision
 * (at every one when revisiting); going back stops at each.
 */
final class Walk {

    private final List<MutantResult> survivors;
    private final Predicate<MutantResult> decided;
    private final boolean revisit;
    private int at;

    private Walk(List<MutantResult> survivors, Predicate<MutantResult> decided, boolean revisit, int at) {
        this.survivors = survivors;
        this.decided = decided;
        this.revisit = revisit;
        this.at = at;
    }

    /** At the first survivor without a decision, or the very first when revisiting; past the end when none. */
    static Walk start(List<MutantResult> survivors, Predicate<MutantResult> decided, boolean revisit) {
        Walk walk = new Walk(survivors, decided, revisit, -1);
        walk.forward();
        return walk;
    }

    boolean finished() {
        return at >= survivors.size();
    }

    MutantResult current() {
        return survivors.get(at);
    }

    /** 1-based, for showing. */
    int position() {
        return at + 1;
    }

    int size() {
        return survivors.size();
    }

    List<MutantResult> survivors() {
        return survivors;
    }

    /** To the next survivor to stop at; false when there is none (the walk is then finished). */
    boolean forward() {
        at = nextStop(at);
        return !finished();
    }

    /** Whether a survivor to stop at comes after this one. */
    boolean hasNext() {
        return nextStop(at) < survivors.size();
    }

    /**
     * From the end round to the first survivor to stop at (the first without a decision, or the very first when
     * revisiting), other than this one; false, staying here, when there is no other.
     */
    boolean wrap() {
        int first = nextStop(-1);
        if (first == at) {
            first = nextStop(first);
        }
        if (first >= survivors.size()) {
            return false;
        }
        at = first;
        return true;
    }

    private int nextStop(int from) {
        int next = from + 1;
        while (next < survivors.size() && !revisit && decided.test(survivors.get(next))) {
            next++;
        }
        return next;
    }

    /** To the previous survivor; false when already at the first. */
    boolean back() {
        if (at <= 0) {
            return false;
        }
        at = Math.min(at, survivors.size()) - 1;
        return true;
    }

    /** To the given survivor, one of this walk's. */
    void goTo(MutantResult survivor) {
        int index = survivors.indexOf(survivor);
        if (index < 0) {
            throw new IllegalArgumentException("not a survivor of this walk: " + survivor.id());
        }
        at = index;
    }

    /** Where the next triage will start: the first survivor without a decision. */
    Optional<MutantResult> resumesAt() {
        return survivors.stream().filter(decided.negate()).findFirst();
    }
}
