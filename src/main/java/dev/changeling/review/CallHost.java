package dev.changeling.review;

import com.github.javaparser.JavaParser;
import com.github.javaparser.ParseResult;
import com.github.javaparser.ParserConfiguration;
import com.github.javaparser.ast.expr.Expression;
import com.github.javaparser.ast.expr.MethodCallExpr;
import com.github.javaparser.ast.stmt.ExpressionStmt;
import com.github.javaparser.ast.stmt.Statement;
import java.util.Optional;

/**
 * A mutation host that is one method call and nothing else, as its whitespace-normalised text reads
 * ({@code metrics.count(x);}, {@code crops()}): the callee, that is the receiver and the method's name as
 * written, and the glob of a suppression rule that matches every call of that callee in the same shape.
 *
 * @param callee the text up to the method's name, such as {@code metrics.count}
 * @param glob   the callee with any arguments, and the semicolon when the host is a statement: {@code metrics.count(*);}
 */
public record CallHost(String callee, String glob) {

    private static final String STATEMENT_END = ";";

    /**
     * The call the host text is, if it is one. None for any other host, and for a callee holding a glob's own
     * characters ({@code *}, {@code ?}), which a rule cannot match narrowly.
     */
    public static Optional<CallHost> of(String hostText) {
        String text = hostText.strip();
        boolean statement = text.endsWith(STATEMENT_END);
        Optional<MethodCallExpr> call = statement ? callStatement(text) : callExpression(text);
        return call.flatMap(found -> found.getName().getEnd())
                .map(nameEnd -> text.substring(0, nameEnd.column))
                .filter(callee -> callee.indexOf('*') < 0 && callee.indexOf('?') < 0)
                .map(callee -> new CallHost(callee, callee + "(*)" + (statement ? STATEMENT_END : "")));
    }

    private static Optional<MethodCallExpr> callStatement(String text) {
        return only(parser().parseStatement(text))
                .filter(Statement::isExpressionStmt)
                .map(statement -> ((ExpressionStmt) statement).getExpression())
                .flatMap(CallHost::asCall);
    }

    private static Optional<MethodCallExpr> callExpression(String text) {
        return only(parser().parseExpression(text)).flatMap(CallHost::asCall);
    }

    private static Optional<MethodCallExpr> asCall(Expression expression) {
        return expression.isMethodCallExpr() ? Optional.of(expression.asMethodCallExpr()) : Optional.empty();
    }

    private static <T> Optional<T> only(ParseResult<T> result) {
        return result.isSuccessful() ? result.getResult() : Optional.empty();
    }

    private static JavaParser parser() {
        return new JavaParser(new ParserConfiguration().setLanguageLevel(ParserConfiguration.LanguageLevel.JAVA_17));
    }
}
