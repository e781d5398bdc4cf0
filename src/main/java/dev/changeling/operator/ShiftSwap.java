package dev.changeling.operator;

import dev.changeling.operator.syntax.OperatorFamily;
import static com.github.javaparser.ast.expr.BinaryExpr.Operator.LEFT_SHIFT;
import static com.github.javaparser.ast.expr.BinaryExpr.Operator.SIGNED_RIGHT_SHIFT;
import static com.github.javaparser.ast.expr.BinaryExpr.Operator.UNSIGNED_RIGHT_SHIFT;

import com.github.javaparser.ast.Node;

/** Replaces {@code << >> >>>}, also in compound assignments, by each of the other two. */
public final class ShiftSwap implements MutationOperator {

    private static final OperatorFamily SHIFTS = new OperatorFamily(LEFT_SHIFT, SIGNED_RIGHT_SHIFT, UNSIGNED_RIGHT_SHIFT);

    @Override
    public String id() {
        return "shift-swap";
    }

    @Override
    public void visit(Node node, Proposals out) {
        if (!SHIFTS.applies(node)) {
            return;
        }
        SHIFTS.swapEach(node, out);
    }
}
