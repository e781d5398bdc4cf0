package dev.changeling.mutant;

import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.body.AnnotationDeclaration;
import com.github.javaparser.ast.body.AnnotationMemberDeclaration;
import com.github.javaparser.ast.body.CallableDeclaration;
import com.github.javaparser.ast.body.EnumConstantDeclaration;
import com.github.javaparser.ast.body.FieldDeclaration;
import com.github.javaparser.ast.body.InitializerDeclaration;
import com.github.javaparser.ast.body.TypeDeclaration;
import com.github.javaparser.ast.body.VariableDeclarator;
import com.github.javaparser.ast.expr.AnnotationExpr;
import com.github.javaparser.ast.expr.LambdaExpr;
import com.github.javaparser.ast.expr.VariableDeclarationExpr;
import com.github.javaparser.ast.nodeTypes.NodeWithModifiers;
import com.github.javaparser.ast.stmt.SwitchEntry;
import com.github.javaparser.ast.body.ClassOrInterfaceDeclaration;
import com.github.javaparser.ast.Modifier;
import dev.changeling.operator.syntax.ConstantExpressions;

/**
 * Where a mutant cannot mean anything or cannot compile by construction: annotations, case labels,
 * constant initialisers, generated types. Also tells which code runs once per JVM.
 */
final class Eligibility {

    private Eligibility() {
    }

    static boolean excluded(Node node) {
        for (Node at = node, child = null; at != null; child = at, at = at.getParentNode().orElse(null)) {
            if (at instanceof AnnotationExpr || at instanceof AnnotationDeclaration
                    || at instanceof AnnotationMemberDeclaration) {
                return true;
            }
            Node from = child;
            if (at instanceof SwitchEntry entry && entry.getLabels().stream().anyMatch(label -> label == from)) {
                return true;
            }
            if (at instanceof VariableDeclarator variable
                    && variable.getInitializer().filter(init -> init == from && ConstantExpressions.literalOnly(init)).isPresent()
                    && isFinal(variable)) {
                return true;
            }
            if (at instanceof TypeDeclaration<?> type && isGenerated(type)) {
                return true;
            }
        }
        return false;
    }

    /** Whether the node runs in a static initialiser, a static field's or an enum constant's initialiser. */
    static boolean oncePerJvm(Node node) {
        for (Node at = node; at != null; at = at.getParentNode().orElse(null)) {
            if (at instanceof LambdaExpr || at instanceof CallableDeclaration<?>) {
                return false;
            }
            if (at instanceof InitializerDeclaration initializer) {
                return initializer.isStatic();
            }
            if (at instanceof FieldDeclaration field) {
                return field.isStatic() || inInterface(field);
            }
            if (at instanceof EnumConstantDeclaration) {
                return true;
            }
        }
        return false;
    }

    private static boolean isFinal(VariableDeclarator variable) {
        Node parent = variable.getParentNode().orElse(null);
        if (parent instanceof FieldDeclaration field) {
            return field.isFinal() || inInterface(field);
        }
        if (parent instanceof VariableDeclarationExpr local) {
            return local.isFinal();
        }
        return parent instanceof NodeWithModifiers<?> modifiers && modifiers.hasModifier(Modifier.Keyword.FINAL);
    }

    private static boolean inInterface(FieldDeclaration field) {
        return field.getParentNode()
                .filter(ClassOrInterfaceDeclaration.class::isInstance)
                .map(parent -> ((ClassOrInterfaceDeclaration) parent).isInterface())
                .orElse(false);
    }

    private static boolean isGenerated(TypeDeclaration<?> type) {
        return type.getAnnotations().stream().anyMatch(annotation -> annotation.getNameAsString().endsWith("Generated"));
    }
}
