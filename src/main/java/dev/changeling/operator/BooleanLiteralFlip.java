package dev.changeling.operator;

import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.expr.BooleanLiteralExpr;

/** Replaces {@code true} by {@code false} and back. */
public final class BooleanLiteralFlip implements MutationOperator {

    @Override
    public String id() {
        return "boolean-literal-flip";
    }

    @Override
    public void visit(Node node, Proposals out) {
        if (!(node instanceof BooleanLiteralExpr literal)) {
            return;
        }
        String flipped = Boolean.toString(!literal.getValue());
        out.replaceWhole(literal, flipped, "replaced " + literal.getValue() + " with " + flipped);
    }
}
