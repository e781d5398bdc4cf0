package dev.changeling.operator;

import dev.changeling.operator.syntax.OperatorFamily;
import static com.github.javaparser.ast.expr.BinaryExpr.Operator.BINARY_AND;
import static com.github.javaparser.ast.expr.BinaryExpr.Operator.BINARY_OR;
import static com.github.javaparser.ast.expr.BinaryExpr.Operator.XOR;

import com.github.javaparser.ast.Node;

/** Replaces {@code & | ^}, also in compound assignments, by each of the other two. */
public final class BitwiseSwap implements MutationOperator {

    private static final OperatorFamily BITWISE = new OperatorFamily(BINARY_AND, BINARY_OR, XOR);

    @Override
    public String id() {
        return "bitwise-swap";
    }

    @Override
    public void visit(Node node, Proposals out) {
        if (!BITWISE.applies(node)) {
            return;
        }
        BITWISE.swapEach(node, out);
    }
}
