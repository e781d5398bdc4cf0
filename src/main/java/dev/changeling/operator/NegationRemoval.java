package dev.changeling.operator;

import dev.changeling.operator.syntax.Patterns;
import dev.changeling.operator.syntax.UnaryRewrite;
import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.expr.UnaryExpr;

/** Removes a logical complement: {@code !x} becomes {@code x}. */
public final class NegationRemoval implements MutationOperator {

    @Override
    public String id() {
        return "negation-removal";
    }

    @Override
    public void visit(Node node, Proposals out) {
        if (!(node instanceof UnaryExpr unary) || unary.getOperator() != UnaryExpr.Operator.LOGICAL_COMPLEMENT) {
            return;
        }
        if (Patterns.bindIn(unary)) {
            return;
        }
        UnaryRewrite.remove(unary, out, "removed the !");
    }
}
