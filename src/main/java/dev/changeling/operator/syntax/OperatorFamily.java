package dev.changeling.operator.syntax;

import dev.changeling.operator.Operators;
import dev.changeling.operator.Proposals;
import static com.github.javaparser.ast.expr.BinaryExpr.Operator.BINARY_OR;
import static com.github.javaparser.ast.expr.BinaryExpr.Operator.DIVIDE;
import static com.github.javaparser.ast.expr.BinaryExpr.Operator.LEFT_SHIFT;
import static com.github.javaparser.ast.expr.BinaryExpr.Operator.MINUS;
import static com.github.javaparser.ast.expr.BinaryExpr.Operator.MULTIPLY;
import static com.github.javaparser.ast.expr.BinaryExpr.Operator.PLUS;
import static com.github.javaparser.ast.expr.BinaryExpr.Operator.SIGNED_RIGHT_SHIFT;
import static com.github.javaparser.ast.expr.BinaryExpr.Operator.UNSIGNED_RIGHT_SHIFT;
import static com.github.javaparser.ast.expr.BinaryExpr.Operator.XOR;

import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.expr.AssignExpr;
import com.github.javaparser.ast.expr.BinaryExpr;
import com.github.javaparser.ast.expr.Expression;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalLong;
import java.util.Set;

/**
 * Binary operators that stand in for one another: each member is swapped for every other, plain or
 * compound ({@code +=}), except where both give the same value for the right operand written.
 */
public final class OperatorFamily {

    /** Operators that agree when the right operand is this integer literal: {@code x + 0} is {@code x - 0}. */
    private static final Map<Long, List<Set<BinaryExpr.Operator>>> AGREE_ON = Map.of(
            0L, List.of(Set.of(PLUS, MINUS), Set.of(LEFT_SHIFT, SIGNED_RIGHT_SHIFT, UNSIGNED_RIGHT_SHIFT), Set.of(BINARY_OR, XOR)),
            1L, List.of(Set.of(MULTIPLY, DIVIDE)));

    private final List<BinaryExpr.Operator> members;

    public OperatorFamily(BinaryExpr.Operator... members) {
        this.members = List.of(members);
    }

    /** Whether {@code node} is a binary expression or compound assignment with an operator of this family. */
    public boolean applies(Node node) {
        return memberAt(node).isPresent();
    }

    /** Proposes each other member in place of the one at {@code node}. */
    public void swapEach(Node node, Proposals out) {
        BinaryExpr.Operator from = memberAt(node).orElseThrow();
        OptionalLong right = IntegerLiterals.value(rightOperand(node));
        for (BinaryExpr.Operator to : members) {
            if (to == from || right.isPresent() && agree(from, to, right.getAsLong())) {
                continue;
            }
            if (node instanceof BinaryExpr binary) {
                OperatorRewrite.swap(binary, to, out);
            } else {
                OperatorRewrite.swap((AssignExpr) node, to.toAssignOperator().orElseThrow(), out);
            }
        }
    }

    private static boolean agree(BinaryExpr.Operator from, BinaryExpr.Operator to, long right) {
        return AGREE_ON.getOrDefault(right, List.of()).stream().anyMatch(set -> set.contains(from) && set.contains(to));
    }

    private static Expression rightOperand(Node node) {
        return node instanceof BinaryExpr binary ? binary.getRight() : ((AssignExpr) node).getValue();
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
