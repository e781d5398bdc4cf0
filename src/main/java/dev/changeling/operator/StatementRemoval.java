package dev.changeling.operator;

import dev.changeling.operator.syntax.CatchClauses;
import dev.changeling.operator.syntax.DefiniteAssignment;
import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.expr.AssignExpr;
import com.github.javaparser.ast.expr.Expression;
import com.github.javaparser.ast.expr.LambdaExpr;
import com.github.javaparser.ast.expr.MethodCallExpr;
import com.github.javaparser.ast.stmt.BlockStmt;
import com.github.javaparser.ast.stmt.ExpressionStmt;
import com.github.javaparser.ast.stmt.SwitchEntry;

/** Removes a statement that is a method call or an assignment. */
public final class StatementRemoval implements MutationOperator {

    @Override
    public String id() {
        return "statement-removal";
    }

    @Override
    public void visit(Node node, Proposals out) {
        if (!(node instanceof ExpressionStmt statement)) {
            return;
        }
        Expression expression = statement.getExpression();
        if (!(expression instanceof MethodCallExpr) && !(expression instanceof AssignExpr)) {
            return;
        }
        Node parent = statement.getParentNode().orElse(null);
        // An expression lambda's body and an arrow case's body stand where an expression must; the
        // schema form (an if) could not stand there either.
        if (parent instanceof LambdaExpr
                || parent instanceof SwitchEntry entry && entry.getType() != SwitchEntry.Type.STATEMENT_GROUP) {
            return;
        }
        if (DefiniteAssignment.dependsOn(statement) || CatchClauses.wouldOrphan(statement)) {
            return;
        }
        String description = expression instanceof AssignExpr ? "removed the assignment" : "removed the call";
        if (parent instanceof BlockStmt || parent instanceof SwitchEntry) {
            out.delete(statement, description);
        } else {
            // The body of an if, else, loop or label needs a statement in its place.
            out.replaceWhole(statement, ";", description);
        }
    }
}
