package dev.changeling.operator.syntax;

import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.body.FieldDeclaration;
import com.github.javaparser.ast.body.Parameter;
import com.github.javaparser.ast.body.RecordDeclaration;
import com.github.javaparser.ast.body.VariableDeclarator;
import com.github.javaparser.ast.expr.AssignExpr;
import com.github.javaparser.ast.expr.VariableDeclarationExpr;
import com.github.javaparser.ast.stmt.Statement;

/**
 * Tells which statements javac's definite-assignment rules may depend on: those assigning a local
 * declared without initializer, a final field or a record component. Removing one could leave a
 * variable unassigned.
 */
public final class DefiniteAssignment {

    private DefiniteAssignment() {
    }

    public static boolean dependsOn(Statement statement) {
        return statement.findAll(AssignExpr.class).stream().anyMatch(DefiniteAssignment::mayBeFirst);
    }

    private static boolean mayBeFirst(AssignExpr assignment) {
        Node declaration = Declarations.declarationOf(assignment.getTarget()).orElse(null);
        if (declaration instanceof VariableDeclarator variable) {
            Node owner = variable.getParentNode().orElse(null);
            return owner instanceof VariableDeclarationExpr && variable.getInitializer().isEmpty()
                    || owner instanceof FieldDeclaration field && field.isFinal();
        }
        return declaration instanceof Parameter parameter
                && parameter.getParentNode().filter(RecordDeclaration.class::isInstance).isPresent();
    }
}
