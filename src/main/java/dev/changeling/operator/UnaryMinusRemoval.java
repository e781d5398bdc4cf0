package dev.changeling.operator;

import dev.changeling.operator.syntax.IntegerLiterals;
import dev.changeling.operator.syntax.UnaryRewrite;
import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.expr.Expression;
import com.github.javaparser.ast.expr.UnaryExpr;

/** Removes a unary minus: {@code -x} becomes {@code x}. */
public final class UnaryMinusRemoval implements MutationOperator {

    @Override
    public String id() {
        return "unary-minus-removal";
    }

    @Override
    public void visit(Node node, Proposals out) {
        if (!(node instanceof UnaryExpr unary) || unary.getOperator() != UnaryExpr.Operator.MINUS) {
            return;
        }
        Expression operand = unary.getExpression();
        // -2147483648 has no positive twin, and an integer -0 is 0 already.
        if (IntegerLiterals.onlyNegatable(operand) || IntegerLiterals.isZero(operand)) {
            return;
        }
        UnaryRewrite.remove(unary, out, "removed the unary minus");
    }
}
