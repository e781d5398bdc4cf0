package dev.changeling.operator;

import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.expr.StringLiteralExpr;
import com.github.javaparser.ast.expr.TextBlockLiteralExpr;

/** Replaces a non-empty string literal or text block by the empty string {@code ""}. */
public final class StringLiteralBlank implements MutationOperator {

    @Override
    public String id() {
        return "string-literal-blank";
    }

    @Override
    public void visit(Node node, Proposals out) {
        boolean nonEmpty = node instanceof StringLiteralExpr string && !string.getValue().isEmpty()
                || node instanceof TextBlockLiteralExpr block && !block.stripIndent().isEmpty();
        if (!nonEmpty) {
            return;
        }
        out.replaceWhole(node, "\"\"", "replaced the string with \"\"");
    }
}
