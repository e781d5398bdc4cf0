package dev.changeling.review.triage;

import dev.changeling.results.MutantResult;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/** How far a session has come: decided and left, by kind of decision. */
record Counts(int survivors, Map<Decision.Kind, Integer> byKind, int skipped) {

    static Counts of(List<MutantResult> survivors, Decisions decisions, Set<String> skipped) {
        Map<Decision.Kind, Integer> byKind = new EnumMap<>(Decision.Kind.class);
        for (Decision.Kind kind : Decision.Kind.values()) {
            byKind.put(kind, 0);
        }
        int skippedLeft = 0;
        for (MutantResult mutant : survivors) {
            var decision = decisions.of(mutant);
            if (decision.isPresent()) {
                byKind.merge(decision.get().kind(), 1, Integer::sum);
            } else if (skipped.contains(mutant.id())) {
                skippedLeft++;
            }
        }
        return new Counts(survivors.size(), byKind, skippedLeft);
    }

    int decided() {
        return byKind.values().stream().mapToInt(Integer::intValue).sum();
    }

    int left() {
        return survivors - decided();
    }

    String line() {
        return decided() + " of " + survivors + " decided (" + byKind.get(Decision.Kind.EQUIVALENT) + " equivalent, "
                + byKind.get(Decision.Kind.NEEDS_TEST) + " needs a test, " + byKind.get(Decision.Kind.FIXED) + " fixed) · "
                + left() + " left" + (skipped > 0 ? ", " + skipped + " of them skipped" : "");
    }
}
