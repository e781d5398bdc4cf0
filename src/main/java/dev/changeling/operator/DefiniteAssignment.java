package dev.changeling.operator;

import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.body.CallableDeclaration;
import com.github.javaparser.ast.body.FieldDeclaration;
import com.github.javaparser.ast.body.InitializerDeclaration;
import com.github.javaparser.ast.body.RecordDeclaration;
import com.github.javaparser.ast.body.TypeDeclaration;
import com.github.javaparser.ast.body.VariableDeclarator;
import com.github.javaparser.ast.expr.AssignExpr;
import com.github.javaparser.ast.expr.FieldAccessExpr;
import com.github.javaparser.ast.expr.NameExpr;
import com.github.javaparser.ast.expr.ThisExpr;
import com.github.javaparser.ast.expr.VariableDeclarationExpr;
import com.github.javaparser.ast.stmt.Statement;

/**
 * Tells which statements javac's definite-assignment rules may depend on: those assigning a local
 * declared without initializer, or a final field. Removing one could leave a variable unassigned.
 */
final class DefiniteAssignment {

    private DefiniteAssignment() {
    }

    static boolean dependsOn(Statement statement) {
        return statement.findAll(AssignExpr.class).stream().anyMatch(DefiniteAssignment::mayBeFirst);
    }

    private static boolean mayBeFirst(AssignExpr assignment) {
        if (assignment.getTarget() instanceof NameExpr name) {
            String variable = name.getNameAsString();
            return declaredWithoutInitializer(assignment, variable) || finalField(assignment, variable);
        }
        if (assignment.getTarget() instanceof FieldAccessExpr field && field.getScope() instanceof ThisExpr) {
            return finalField(assignment, field.getNameAsString());
        }
        return false;
    }

    private static boolean declaredWithoutInitializer(Node at, String variable) {
        Node body = at.findAncestor(n -> n instanceof CallableDeclaration<?> || n instanceof InitializerDeclaration
                || n instanceof FieldDeclaration, Node.class).orElse(null);
        return body != null && body.findAll(VariableDeclarator.class).stream()
                .anyMatch(v -> v.getNameAsString().equals(variable) && v.getInitializer().isEmpty()
                        && v.getParentNode().filter(VariableDeclarationExpr.class::isInstance).isPresent());
    }

    private static boolean finalField(Node at, String variable) {
        TypeDeclaration<?> type = at.findAncestor(TypeDeclaration.class).orElse(null);
        if (type == null) {
            return false;
        }
        boolean finalDeclared = type.getFields().stream().filter(FieldDeclaration::isFinal)
                .flatMap(field -> field.getVariables().stream())
                .anyMatch(v -> v.getNameAsString().equals(variable));
        boolean recordComponent = type instanceof RecordDeclaration record
                && record.getParameters().stream().anyMatch(p -> p.getNameAsString().equals(variable));
        return finalDeclared || recordComponent;
    }
}
