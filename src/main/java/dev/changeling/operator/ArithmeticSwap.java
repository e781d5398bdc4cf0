package dev.changeling.operator;

import dev.changeling.operator.syntax.Concatenation;
import dev.changeling.operator.syntax.OperatorFamily;
import static com.github.javaparser.ast.expr.BinaryExpr.Operator.DIVIDE;
import static com.github.javaparser.ast.expr.BinaryExpr.Operator.MINUS;
import static com.github.javaparser.ast.expr.BinaryExpr.Operator.MULTIPLY;
import static com.github.javaparser.ast.expr.BinaryExpr.Operator.PLUS;
import static com.github.javaparser.ast.expr.BinaryExpr.Operator.REMAINDER;

import com.github.javaparser.ast.Node;

/** Replaces {@code + - * / %}, also in compound assignments, by each of the other four; evident string joins stay. */
public final class ArithmeticSwap implements MutationOperator {

    private static final OperatorFamily ARITHMETIC = new OperatorFamily(PLUS, MINUS, MULTIPLY, DIVIDE, REMAINDER);

    @Override
    public String id() {
        return "arithmetic-swap";
    }

    @Override
    public void visit(Node node, Proposals out) {
        if (!ARITHMETIC.applies(node) || Concatenation.evident(node)) {
            return;
        }
        ARITHMETIC.swapEach(node, out);
    }
}
