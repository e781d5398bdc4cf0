package dev.changeling.operator.syntax;

import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.expr.ArrayAccessExpr;
import com.github.javaparser.ast.expr.AssignExpr;
import com.github.javaparser.ast.expr.BinaryExpr;
import com.github.javaparser.ast.expr.CastExpr;
import com.github.javaparser.ast.expr.ConditionalExpr;
import com.github.javaparser.ast.expr.EnclosedExpr;
import com.github.javaparser.ast.expr.Expression;
import com.github.javaparser.ast.expr.FieldAccessExpr;
import com.github.javaparser.ast.expr.InstanceOfExpr;
import com.github.javaparser.ast.expr.LambdaExpr;
import com.github.javaparser.ast.expr.MethodCallExpr;
import com.github.javaparser.ast.expr.UnaryExpr;

/** Java operator precedence, higher binds tighter, so that rewrites keep the tree they mean. */
public final class Precedence {

    public static final int ASSIGNMENT = 1;
    public static final int CONDITIONAL = 2;
    public static final int UNARY = 13;
    public static final int PRIMARY = 14;

    private Precedence() {
    }

    public static int of(BinaryExpr.Operator operator) {
        return switch (operator) {
            case OR -> 3;
            case AND -> 4;
            case BINARY_OR -> 5;
            case XOR -> 6;
            case BINARY_AND -> 7;
            case EQUALS, NOT_EQUALS -> 8;
            case LESS, GREATER, LESS_EQUALS, GREATER_EQUALS -> 9;
            case LEFT_SHIFT, SIGNED_RIGHT_SHIFT, UNSIGNED_RIGHT_SHIFT -> 10;
            case PLUS, MINUS -> 11;
            case MULTIPLY, DIVIDE, REMAINDER -> 12;
        };
    }

    public static int of(Expression expression) {
        if (expression instanceof BinaryExpr binary) {
            return of(binary.getOperator());
        }
        if (expression instanceof InstanceOfExpr) {
            return 9;
        }
        if (expression instanceof ConditionalExpr) {
            return CONDITIONAL;
        }
        if (expression instanceof AssignExpr || expression instanceof LambdaExpr) {
            return ASSIGNMENT;
        }
        if (expression instanceof UnaryExpr || expression instanceof CastExpr) {
            return UNARY;
        }
        return PRIMARY;
    }

    /** The expression inside any number of parentheses. */
    public static Expression unparenthesised(Expression expression) {
        Expression bare = expression;
        while (bare instanceof EnclosedExpr enclosed) {
            bare = enclosed.getInner();
        }
        return bare;
    }

    /**
     * Whether an expression of precedence {@code level}, put where {@code node} stands, needs
     * parentheses to keep its parent's meaning.
     */
    public static boolean needsParenthesesAt(Node node, int level) {
        Node parent = node.getParentNode().orElse(null);
        if (parent instanceof BinaryExpr binary) {
            int parentLevel = of(binary.getOperator());
            return binary.getLeft() == node ? level < parentLevel : level <= parentLevel;
        }
        if (parent instanceof UnaryExpr || parent instanceof CastExpr) {
            return level < UNARY;
        }
        if (parent instanceof InstanceOfExpr) {
            return level <= 9;
        }
        if (parent instanceof ConditionalExpr conditional) {
            return conditional.getCondition() == node ? level <= CONDITIONAL : level < CONDITIONAL;
        }
        if (parent instanceof MethodCallExpr || parent instanceof FieldAccessExpr) {
            return level < PRIMARY && isScope(parent, node);
        }
        if (parent instanceof ArrayAccessExpr access) {
            return level < PRIMARY && access.getName() == node;
        }
        return false;
    }

    private static boolean isScope(Node parent, Node node) {
        if (parent instanceof MethodCallExpr call) {
            return call.getScope().map(scope -> scope == node).orElse(false);
        }
        return ((FieldAccessExpr) parent).getScope() == node;
    }
}
