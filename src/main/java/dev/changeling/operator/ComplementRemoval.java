package dev.changeling.operator;

import dev.changeling.operator.syntax.UnaryRewrite;
import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.expr.UnaryExpr;

/** Removes a bitwise complement: {@code ~x} becomes {@code x}. */
public final class ComplementRemoval implements MutationOperator {

    @Override
    public String id() {
        return "complement-removal";
    }

    @Override
    public void visit(Node node, Proposals out) {
        if (!(node instanceof UnaryExpr unary) || unary.getOperator() != UnaryExpr.Operator.BITWISE_COMPLEMENT) {
            return;
        }
        UnaryRewrite.remove(unary, out, "removed the ~");
    }
}
