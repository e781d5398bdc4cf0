package dev.changeling.operator;

import dev.changeling.operator.syntax.LoopConditions;
import dev.changeling.operator.syntax.Patterns;
import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.expr.ArrayAccessExpr;
import com.github.javaparser.ast.expr.BooleanLiteralExpr;
import com.github.javaparser.ast.expr.ConditionalExpr;
import com.github.javaparser.ast.expr.EnclosedExpr;
import com.github.javaparser.ast.expr.Expression;
import com.github.javaparser.ast.expr.FieldAccessExpr;
import com.github.javaparser.ast.expr.MethodCallExpr;
import com.github.javaparser.ast.expr.NameExpr;
import com.github.javaparser.ast.expr.UnaryExpr;
import com.github.javaparser.ast.stmt.IfStmt;

/** Negates the condition of an if, while, do, for or {@code ?:}: {@code c} becomes {@code !(c)}. */
public final class ConditionNegation implements MutationOperator {

    @Override
    public String id() {
        return "condition-negation";
    }

    @Override
    public void visit(Node node, Proposals out) {
        if (!(node instanceof Expression condition) || !isCondition(condition)) {
            return;
        }
        if (condition instanceof BooleanLiteralExpr || isNegation(condition) || Patterns.bindIn(condition)) {
            return;
        }
        String text = out.text(condition);
        String negated = bindsTightly(condition) ? "!" + text : "!(" + text + ")";
        out.replaceWhole(condition, negated, "negated the condition");
    }

    private static boolean isCondition(Expression expression) {
        Node parent = expression.getParentNode().orElse(null);
        Expression condition = LoopConditions.conditionOf(parent);
        if (parent instanceof IfStmt statement) {
            condition = statement.getCondition();
        } else if (parent instanceof ConditionalExpr conditional) {
            condition = conditional.getCondition();
        }
        return condition == expression;
    }

    /** A condition that already is {@code !x}: removing that {@code !} (negation-removal) is the same change. */
    private static boolean isNegation(Expression condition) {
        return condition instanceof UnaryExpr unary && unary.getOperator() == UnaryExpr.Operator.LOGICAL_COMPLEMENT;
    }

    private static boolean bindsTightly(Expression condition) {
        return condition instanceof NameExpr || condition instanceof MethodCallExpr || condition instanceof FieldAccessExpr
                || condition instanceof ArrayAccessExpr || condition instanceof EnclosedExpr;
    }
}
