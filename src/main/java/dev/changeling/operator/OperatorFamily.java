package dev.changeling.operator;

import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.expr.AssignExpr;
import com.github.javaparser.ast.expr.BinaryExpr;
import java.util.List;
import java.util.Optional;

/** Binary operators that stand in for one another: each member is swapped for every other, plain or compound ({@code +=}). */
final class OperatorFamily {

    private final List<BinaryExpr.Operator> members;

    OperatorFamily(BinaryExpr.Operator... members) {
        this.members = List.of(members);
    }

    /** Whether {@code node} is a binary expression or compound assignment with an operator of this family. */
    boolean applies(Node node) {
        return memberAt(node).isPresent();
    }

    /** Proposes each other member in place of the one at {@code node}. */
    void swapEach(Node node, Proposals out) {
        BinaryExpr.Operator from = memberAt(node).orElseThrow();
        for (BinaryExpr.Operator to : members) {
            if (to == from) {
                continue;
            }
            if (node instanceof BinaryExpr binary) {
                OperatorRewrite.swap(binary, to, out);
            } else {
                OperatorRewrite.swap((AssignExpr) node, to.toAssignOperator().orElseThrow(), out);
            }
        }
    }

    private Optional<BinaryExpr.Operator> memberAt(Node node) {
        if (node instanceof BinaryExpr binary) {
            return Optional.of(binary.getOperator()).filter(members::contains);
        }
        if (node instanceof AssignExpr assignment) {
            return assignment.getOperator().toBinaryOperator().filter(members::contains);
        }
        return Optional.empty();
    }
}
