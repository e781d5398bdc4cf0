package dev.changeling.operator;

import dev.changeling.operator.syntax.UnaryRewrite;
import static com.github.javaparser.ast.expr.UnaryExpr.Operator.POSTFIX_DECREMENT;
import static com.github.javaparser.ast.expr.UnaryExpr.Operator.POSTFIX_INCREMENT;
import static com.github.javaparser.ast.expr.UnaryExpr.Operator.PREFIX_DECREMENT;
import static com.github.javaparser.ast.expr.UnaryExpr.Operator.PREFIX_INCREMENT;

import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.expr.UnaryExpr;
import java.util.Map;

/** Replaces {@code ++} by {@code --} and back, prefix and postfix alike. */
public final class IncrementSwap implements MutationOperator {

    private static final Map<UnaryExpr.Operator, UnaryExpr.Operator> OPPOSITE = Map.of(
            PREFIX_INCREMENT, PREFIX_DECREMENT, PREFIX_DECREMENT, PREFIX_INCREMENT,
            POSTFIX_INCREMENT, POSTFIX_DECREMENT, POSTFIX_DECREMENT, POSTFIX_INCREMENT);

    @Override
    public String id() {
        return "increment-swap";
    }

    @Override
    public void visit(Node node, Proposals out) {
        if (!(node instanceof UnaryExpr unary) || !OPPOSITE.containsKey(unary.getOperator())) {
            return;
        }
        UnaryRewrite.swap(unary, OPPOSITE.get(unary.getOperator()), out);
    }
}
