package dev.changeling.operator;

import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;
import java.util.stream.Stream;

/** The one registry of mutation operators: every operator is listed here, nothing is found by scanning. */
public final class Operators {

    private static final List<MutationOperator> DEFAULTS = List.of(
            new RelationalSubset(),
            new ArithmeticSwap(),
            new ConnectiveSwap(),
            new ConditionNegation(),
            new NegationRemoval(),
            new IncrementSwap(),
            new UnaryMinusRemoval(),
            new BooleanLiteralFlip(),
            new ReturnValueBlank(),
            new StatementRemoval());

    private static final List<MutationOperator> ON_REQUEST = List.of(
            new RelationalAll(),
            new IntegerLiteralNudge(),
            new StringLiteralBlank(),
            new BitwiseSwap(),
            new ShiftSwap(),
            new ComplementRemoval());

    private Operators() {
    }

    /** Every operator, defaults first. */
    public static List<MutationOperator> all() {
        return Stream.concat(DEFAULTS.stream(), ON_REQUEST.stream()).toList();
    }

    /** The operators used when none are named. */
    public static List<MutationOperator> defaults() {
        return DEFAULTS;
    }

    public static boolean isDefault(String id) {
        return DEFAULTS.stream().anyMatch(operator -> operator.id().equals(id));
    }

    public static Optional<MutationOperator> byId(String id) {
        return all().stream().filter(operator -> operator.id().equals(id)).findFirst();
    }

    /** The operators named, in registry order; an unknown id is a user mistake with the known ids in the message. */
    public static List<MutationOperator> named(List<String> ids) {
        for (String id : ids) {
            if (byId(id).isEmpty()) {
                throw new IllegalArgumentException("unknown operator '" + id + "'; known operators: "
                        + all().stream().map(MutationOperator::id).collect(Collectors.joining(", ")));
            }
        }
        return all().stream().filter(operator -> ids.contains(operator.id())).toList();
    }
}
