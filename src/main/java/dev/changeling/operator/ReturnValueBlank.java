package dev.changeling.operator;

import dev.changeling.operator.syntax.BlankValues;
import dev.changeling.operator.syntax.CatchClauses;
import dev.changeling.operator.syntax.Declarations;
import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.body.MethodDeclaration;
import com.github.javaparser.ast.expr.Expression;
import com.github.javaparser.ast.stmt.ReturnStmt;

/**
 * Replaces a returned value by a blank one of the method's declared return type: 0, the other
 * boolean, {@code ""}, an empty collection or Optional, or {@code null} for other references.
 */
public final class ReturnValueBlank implements MutationOperator {

    @Override
    public String id() {
        return "return-value-blank";
    }

    @Override
    public void visit(Node node, Proposals out) {
        if (!(node instanceof ReturnStmt statement) || statement.getExpression().isEmpty()) {
            return;
        }
        MethodDeclaration method = Declarations.enclosingMethod(statement).orElse(null);
        Expression value = statement.getExpression().get();
        if (method == null || CatchClauses.wouldOrphan(value)) {
            return;
        }
        for (String blank : BlankValues.of(method.getType())) {
            if (!BlankValues.alreadyIs(value, blank)) {
                out.replaceWhole(value, blank, "returned " + blank);
            }
        }
    }
}
