package dev.changeling.operator;

import dev.changeling.operator.syntax.OperatorFamily;
import dev.changeling.operator.syntax.Patterns;
import static com.github.javaparser.ast.expr.BinaryExpr.Operator.AND;
import static com.github.javaparser.ast.expr.BinaryExpr.Operator.OR;

import com.github.javaparser.ast.Node;

/** Replaces {@code &&} by {@code ||} and back, keeping short-circuit evaluation. */
public final class ConnectiveSwap implements MutationOperator {

    private static final OperatorFamily CONNECTIVES = new OperatorFamily(AND, OR);

    @Override
    public String id() {
        return "connective-swap";
    }

    @Override
    public void visit(Node node, Proposals out) {
        if (!CONNECTIVES.applies(node) || Patterns.bindIn(node)) {
            return;
        }
        CONNECTIVES.swapEach(node, out);
    }
}
