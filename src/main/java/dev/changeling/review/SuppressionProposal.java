package dev.changeling.review;

import dev.changeling.mutant.Suppressions;
import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;

/**
 * A suppression rule the equivalents list argues for: once {@value #MARKS_NEEDED} first-order mutants of one
 * operator on calls of one callee (in one shape, statement or expression) are listed as equivalent, and no rule
 * leaves them all out yet, a rule for exactly that operator and callee, any arguments.
 *
 * @param kind     the operator and the call
 * @param evidence the listed entries of that kind, in the list's order
 */
public record SuppressionProposal(Kind kind, List<EquivalentEntry> evidence) {

    /** How many equivalents of one kind it takes to propose a rule. */
    public static final int MARKS_NEEDED = 3;

    /** What a rule is proposed for: one operator on one callee's calls. */
    public record Kind(String operator, CallHost call) {
    }

    /**
     * The rule the list argues for now that {@code marked} is on it, if any.
     *
     * @param listed every entry of the list, {@code marked} among them
     * @param rules  the project's rules as they are now
     */
    public static Optional<SuppressionProposal> after(EquivalentEntry marked, List<EquivalentEntry> listed, Suppressions rules) {
        Optional<Kind> kind = kindOf(marked);
        if (kind.isEmpty()) {
            return Optional.empty();
        }
        List<EquivalentEntry> evidence = listed.stream()
                .filter(entry -> entry.operator().equals(marked.operator()) && kindOf(entry).equals(kind)).toList();
        boolean covered = evidence.stream().allMatch(entry -> rules.leavesOut(entry.operator(), entry.original(), entry.member()));
        if (evidence.size() < MARKS_NEEDED || covered) {
            return Optional.empty();
        }
        return Optional.of(new SuppressionProposal(kind.get(), evidence));
    }

    private static Optional<Kind> kindOf(EquivalentEntry entry) {
        if (entry.order() != 1) {
            return Optional.empty();
        }
        return CallHost.of(entry.original()).map(call -> new Kind(entry.operator(), call));
    }

    /** The line to append to the suppressions file, in its syntax. */
    public String line() {
        return kind.operator() + " text " + kind.call().glob() + " -- marked equivalent " + evidence.size() + " times (ids "
                + evidence.stream().map(EquivalentEntry::shortId).collect(Collectors.joining(", ")) + ")";
    }
}
