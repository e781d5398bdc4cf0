package dev.changeling.operator;

import dev.changeling.operator.syntax.Comparisons;
import dev.changeling.operator.syntax.OperatorRewrite;
import static com.github.javaparser.ast.expr.BinaryExpr.Operator.EQUALS;
import static com.github.javaparser.ast.expr.BinaryExpr.Operator.GREATER;
import static com.github.javaparser.ast.expr.BinaryExpr.Operator.GREATER_EQUALS;
import static com.github.javaparser.ast.expr.BinaryExpr.Operator.LESS;
import static com.github.javaparser.ast.expr.BinaryExpr.Operator.LESS_EQUALS;
import static com.github.javaparser.ast.expr.BinaryExpr.Operator.NOT_EQUALS;

import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.expr.BinaryExpr;
import java.util.List;
import java.util.Map;

/** Replaces a comparison by the three replacements that subsume the other four (the default). */
public final class RelationalSubset implements MutationOperator {

    private static final Map<BinaryExpr.Operator, List<BinaryExpr.Operator>> SWAPS = Map.of(
            LESS, List.of(LESS_EQUALS, NOT_EQUALS),
            LESS_EQUALS, List.of(LESS, EQUALS),
            GREATER, List.of(GREATER_EQUALS, NOT_EQUALS),
            GREATER_EQUALS, List.of(GREATER, EQUALS),
            EQUALS, List.of(LESS_EQUALS, GREATER_EQUALS),
            NOT_EQUALS, List.of(LESS, GREATER));

    private static final Map<BinaryExpr.Operator, Boolean> CONSTANT = Map.of(
            LESS, false, LESS_EQUALS, true, GREATER, false, GREATER_EQUALS, true, EQUALS, false, NOT_EQUALS, true);

    @Override
    public String id() {
        return "relational-subset";
    }

    @Override
    public void visit(Node node, Proposals out) {
        if (!(node instanceof BinaryExpr comparison) || !SWAPS.containsKey(comparison.getOperator())) {
            return;
        }
        if (Comparisons.ordered(comparison)) {
            for (BinaryExpr.Operator to : SWAPS.get(comparison.getOperator())) {
                OperatorRewrite.swap(comparison, to, out);
            }
        }
        boolean constant = CONSTANT.get(comparison.getOperator());
        out.replaceWhole(comparison, Boolean.toString(constant), "replaced the comparison with " + constant);
    }
}
