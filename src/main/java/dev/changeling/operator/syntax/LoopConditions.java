package dev.changeling.operator.syntax;

import com.github.javaparser.JavaParser;
import com.github.javaparser.ParserConfiguration;
import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.expr.Expression;
import com.github.javaparser.ast.stmt.DoStmt;
import com.github.javaparser.ast.stmt.ForStmt;
import com.github.javaparser.ast.stmt.WhileStmt;
import dev.changeling.source.SourceFile;
import dev.changeling.source.Span;

/**
 * Keeps every operator from making the condition of a while, do or for loop a constant. javac's
 * reachability rules treat a constant loop condition specially, so such a mutant compiles (or fails)
 * differently alone than in its schema form, where the condition is never constant.
 */
public final class LoopConditions {

    private LoopConditions() {
    }

    /** Whether replacing {@code edit} inside {@code host} would leave a loop condition constant, or touches one that is. */
    public static boolean wouldBeConstant(SourceFile file, Node host, Span edit, String replacement) {
        Expression condition = loopConditionAround(host);
        if (condition == null) {
            return false;
        }
        if (ConstantExpressions.literalOnly(condition)) {
            return true;
        }
        Span span = file.spanOf(condition);
        String text = file.text();
        String mutated = text.substring(span.begin(), edit.begin()) + replacement + text.substring(edit.end(), span.end());
        return new JavaParser(new ParserConfiguration().setLanguageLevel(ParserConfiguration.LanguageLevel.JAVA_17))
                .parseExpression(mutated)
                .getResult()
                .map(ConstantExpressions::literalOnly)
                .orElse(false);
    }

    /** The whole loop condition that {@code host} is part of, reached through expressions only; null if none. */
    private static Expression loopConditionAround(Node host) {
        Node child = host;
        for (Node at = host.getParentNode().orElse(null); child instanceof Expression && at != null;
                child = at, at = at.getParentNode().orElse(null)) {
            Expression condition = conditionOf(at);
            if (condition != null) {
                return condition == child ? condition : null;
            }
        }
        return null;
    }

    /** The condition of a while, do or for loop; null for other nodes and for a for loop without one. */
    public static Expression conditionOf(Node node) {
        if (node instanceof WhileStmt loop) {
            return loop.getCondition();
        }
        if (node instanceof DoStmt loop) {
            return loop.getCondition();
        }
        if (node instanceof ForStmt loop) {
            return loop.getCompare().orElse(null);
        }
        return null;
    }
}
