package dev.changeling.operator;

import dev.changeling.operator.syntax.Comparisons;
import dev.changeling.operator.syntax.OperatorRewrite;
import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.expr.BinaryExpr;

/**
 * Replaces a comparison by each of the other five comparisons, by {@code true} and by {@code false};
 * where an operand is evidently not a number, only {@code ==} and {@code !=} trade places.
 */
public final class RelationalAll implements MutationOperator {

    @Override
    public String id() {
        return "relational-all";
    }

    @Override
    public void visit(Node node, Proposals out) {
        if (!(node instanceof BinaryExpr comparison) || !Comparisons.RELATIONAL.contains(comparison.getOperator())) {
            return;
        }
        BinaryExpr.Operator from = comparison.getOperator();
        boolean ordered = Comparisons.ordered(comparison);
        for (BinaryExpr.Operator to : Comparisons.RELATIONAL) {
            boolean compiles = ordered || Comparisons.isEquality(from) && Comparisons.isEquality(to);
            if (to != from && compiles) {
                OperatorRewrite.swap(comparison, to, out);
            }
        }
        out.replaceWhole(comparison, "true", "replaced the comparison with true");
        out.replaceWhole(comparison, "false", "replaced the comparison with false");
    }
}
