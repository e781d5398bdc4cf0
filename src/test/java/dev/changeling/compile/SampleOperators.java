package dev.changeling.compile;

import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.body.MethodDeclaration;
import com.github.javaparser.ast.expr.AssignExpr;
import com.github.javaparser.ast.expr.BinaryExpr;
import com.github.javaparser.ast.expr.BooleanLiteralExpr;
import com.github.javaparser.ast.expr.IntegerLiteralExpr;
import com.github.javaparser.ast.expr.MethodCallExpr;
import com.github.javaparser.ast.expr.UnaryExpr;
import com.github.javaparser.ast.stmt.ExpressionStmt;
import com.github.javaparser.ast.stmt.ReturnStmt;
import com.github.javaparser.ast.type.PrimitiveType;
import dev.changeling.operator.MutationOperator;
import dev.changeling.operator.syntax.OperatorRewrite;
import dev.changeling.operator.Proposals;
import dev.changeling.operator.RelationalSubset;
import dev.changeling.source.Span;
import java.util.List;
import java.util.Map;
import java.util.function.BiConsumer;

/** Small mutation operators standing in for the real catalogue, so the build meets every kind of host. */
final class SampleOperators {

    private SampleOperators() {
    }

    static MutationOperator of(String id, BiConsumer<Node, Proposals> visit) {
        return new MutationOperator() {
            @Override
            public String id() {
                return id;
            }

            @Override
            public void visit(Node node, Proposals out) {
                visit.accept(node, out);
            }
        };
    }

    private static final Map<BinaryExpr.Operator, BinaryExpr.Operator> ARITHMETIC_SWAPS = Map.of(
            BinaryExpr.Operator.PLUS, BinaryExpr.Operator.MINUS,
            BinaryExpr.Operator.MINUS, BinaryExpr.Operator.PLUS,
            BinaryExpr.Operator.MULTIPLY, BinaryExpr.Operator.DIVIDE,
            BinaryExpr.Operator.DIVIDE, BinaryExpr.Operator.MULTIPLY,
            BinaryExpr.Operator.REMAINDER, BinaryExpr.Operator.MULTIPLY,
            BinaryExpr.Operator.AND, BinaryExpr.Operator.OR,
            BinaryExpr.Operator.OR, BinaryExpr.Operator.AND);

    static final MutationOperator BINARY = of("sample-binary", (node, out) -> {
        if (node instanceof BinaryExpr binary && ARITHMETIC_SWAPS.containsKey(binary.getOperator())) {
            OperatorRewrite.swap(binary, ARITHMETIC_SWAPS.get(binary.getOperator()), out);
        }
    });

    private static final Map<AssignExpr.Operator, AssignExpr.Operator> COMPOUND_SWAPS = Map.of(
            AssignExpr.Operator.PLUS, AssignExpr.Operator.MINUS,
            AssignExpr.Operator.MINUS, AssignExpr.Operator.PLUS,
            AssignExpr.Operator.MULTIPLY, AssignExpr.Operator.DIVIDE);

    static final MutationOperator COMPOUND = of("sample-compound", (node, out) -> {
        if (node instanceof AssignExpr assign && COMPOUND_SWAPS.containsKey(assign.getOperator())) {
            OperatorRewrite.swap(assign, COMPOUND_SWAPS.get(assign.getOperator()), out);
        }
    });

    static final MutationOperator INCREMENTS = of("sample-increments", (node, out) -> {
        if (!(node instanceof UnaryExpr unary)) {
            return;
        }
        Span whole = out.span(unary);
        switch (unary.getOperator()) {
            case POSTFIX_INCREMENT -> out.replace(unary, new Span(whole.end() - 2, whole.end()), "--", "++ to --");
            case POSTFIX_DECREMENT -> out.replace(unary, new Span(whole.end() - 2, whole.end()), "++", "-- to ++");
            case PREFIX_INCREMENT -> out.replace(unary, new Span(whole.begin(), whole.begin() + 2), "--", "++ to --");
            case PREFIX_DECREMENT -> out.replace(unary, new Span(whole.begin(), whole.begin() + 2), "++", "-- to ++");
            default -> {
            }
        }
    });

    static final MutationOperator NEGATION = of("sample-negation", (node, out) -> {
        if (node instanceof UnaryExpr unary && unary.getOperator() == UnaryExpr.Operator.LOGICAL_COMPLEMENT) {
            out.replaceWhole(unary, out.text(unary.getExpression()), "dropped !");
        }
    });

    static final MutationOperator LITERALS = of("sample-literals", (node, out) -> {
        if (node instanceof IntegerLiteralExpr literal && literal.getValue().matches("[0-9]+")) {
            out.replaceWhole(literal, Integer.toString(Integer.parseInt(literal.getValue()) + 1), "literal plus one");
        } else if (node instanceof BooleanLiteralExpr literal) {
            out.replaceWhole(literal, Boolean.toString(!literal.getValue()), "flipped literal");
        }
    });

    static final MutationOperator DELETIONS = of("sample-deletions", (node, out) -> {
        if (node instanceof ExpressionStmt statement
                && (statement.getExpression() instanceof MethodCallExpr
                    || statement.getExpression() instanceof AssignExpr
                    || statement.getExpression() instanceof UnaryExpr)) {
            out.delete(statement, "removed the statement");
        }
    });

    static final MutationOperator RETURNS = of("sample-returns", (node, out) -> {
        if (!(node instanceof ReturnStmt statement) || statement.getExpression().isEmpty()) {
            return;
        }
        MethodDeclaration method = statement.findAncestor(MethodDeclaration.class).orElse(null);
        if (method == null) {
            return;
        }
        String replacement;
        if (method.getType() instanceof PrimitiveType primitive) {
            replacement = switch (primitive.getType()) {
                case INT, LONG, SHORT, BYTE, FLOAT, DOUBLE -> "0";
                default -> null;
            };
        } else {
            replacement = "null";
        }
        if (replacement != null) {
            out.replaceWhole(statement.getExpression().get(), replacement, "returns " + replacement);
        }
    });

    /** Every sample operator and the real relational one. */
    static List<MutationOperator> all() {
        return List.of(new RelationalSubset(), BINARY, COMPOUND, INCREMENTS, NEGATION, LITERALS, DELETIONS, RETURNS);
    }
}
