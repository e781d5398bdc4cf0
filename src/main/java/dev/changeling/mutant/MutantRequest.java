package dev.changeling.mutant;

import dev.changeling.operator.MutationOperator;
import java.util.List;
import java.util.function.Predicate;

/**
 * Which mutants to make.
 *
 * @param operators   the operators to apply
 * @param orders      the orders wanted: 1 for first-order, 2..5 for k-order
 * @param scope       where the points of one k-order mutant come from
 * @param seed        the seed of k-order combination
 * @param pointFilter which points are in scope (files, operators, changed lines)
 * @param mutateDiagnostics whether code whose only effect is diagnostics is mutated too (by default it is not)
 * @param suppressions      the project's rules for points not to make
 * @param budget            how many points each changed line keeps (a review of a change); {@link LineBudget#NONE} elsewhere
 */
public record MutantRequest(
        List<MutationOperator> operators,
        List<Integer> orders,
        HigherOrder.Scope scope,
        long seed,
        Predicate<Point> pointFilter,
        boolean mutateDiagnostics,
        Suppressions suppressions,
        LineBudget budget) {

    public MutantRequest {
        operators = List.copyOf(operators);
        orders = List.copyOf(orders);
        for (int order : orders) {
            if (order < 1 || order > HigherOrder.MAX_ORDER) {
                throw new IllegalArgumentException("an order must be from 1 to " + HigherOrder.MAX_ORDER + ", not " + order);
            }
        }
    }

    /** A request that leaves diagnostics-only code alone, as runs do by default. */
    public MutantRequest(List<MutationOperator> operators, List<Integer> orders, HigherOrder.Scope scope, long seed,
                         Predicate<Point> pointFilter) {
        this(operators, orders, scope, seed, pointFilter, false, Suppressions.none(), LineBudget.NONE);
    }

    /** A request without suppression rules. */
    public MutantRequest(List<MutationOperator> operators, List<Integer> orders, HigherOrder.Scope scope, long seed,
                         Predicate<Point> pointFilter, boolean mutateDiagnostics) {
        this(operators, orders, scope, seed, pointFilter, mutateDiagnostics, Suppressions.none(), LineBudget.NONE);
    }

    /** The same request with the project's suppression rules. */
    public MutantRequest withSuppressions(Suppressions rules) {
        return new MutantRequest(operators, orders, scope, seed, pointFilter, mutateDiagnostics, rules, budget);
    }

    /** The same request with a per-line budget. */
    public MutantRequest withBudget(LineBudget lineBudget) {
        return new MutantRequest(operators, orders, scope, seed, pointFilter, mutateDiagnostics, suppressions, lineBudget);
    }

    /** The same request, keeping only the points {@code filter} also keeps. */
    public MutantRequest narrowedTo(Predicate<Point> filter) {
        return new MutantRequest(operators, orders, scope, seed, pointFilter.and(filter), mutateDiagnostics, suppressions,
                budget);
    }

    public static MutantRequest firstOrder(List<MutationOperator> operators) {
        return new MutantRequest(operators, List.of(1), HigherOrder.Scope.METHOD, 1L, point -> true);
    }
}
