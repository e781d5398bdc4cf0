package dev.changeling.source;

import dev.changeling.Text;
import com.github.javaparser.JavaParser;
import com.github.javaparser.JavaToken;
import com.github.javaparser.ParseResult;
import com.github.javaparser.ParserConfiguration;
import com.github.javaparser.Position;
import com.github.javaparser.Problem;
import com.github.javaparser.Range;
import com.github.javaparser.ast.CompilationUnit;
import com.github.javaparser.ast.expr.Expression;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.function.IntUnaryOperator;

/** Reads and parses Java files at language level 17 with the tab size fixed at 1 for offset arithmetic. */
public final class JavaSources {

    private JavaSources() {
    }

    /**
     * The outcome of parsing one file: a tree or a problem, never both. The tree's ranges are always those of the
     * file as written; {@code decodedEscapes} are the Unicode escapes the tree was read decoded from (JLS §3.3),
     * empty when the file reads the same as written, and no edit may touch them.
     */
    public record Parsed(SourceFile file, CompilationUnit unit, ParseProblem problem, List<Span> decodedEscapes) {
        public Parsed {
            decodedEscapes = List.copyOf(decodedEscapes);
        }

        public boolean ok() {
            return unit != null;
        }

        /** Whether a span of the written file holds part of an escape the parser read decoded. */
        public boolean touchesDecodedEscape(Span span) {
            return decodedEscapes.stream().anyMatch(span::overlaps);
        }
    }

    public static SourceFile read(Path projectRoot, Path file) throws IOException {
        String text = Files.readString(file, StandardCharsets.UTF_8);
        return SourceFile.of(projectRoot.relativize(file).toString(), text);
    }

    /**
     * Parses a file the way javac reads it. JavaParser reads a Unicode escape (JLS §3.3) only inside a literal or
     * a name, and as part of it; javac decodes every escape first. So a file with escapes is also parsed decoded,
     * and when the two readings differ in their tokens (an escaped operator, or an escaped line end that ends a
     * comment), the decoded tree is the one kept, with each node's range moved back onto the written text.
     */
    public static Parsed parse(SourceFile file) {
        JavaParser parser = new JavaParser(configuration());
        ParseResult<CompilationUnit> written = parser.parse(file.text());
        if (!file.text().contains("\\u")) {
            return succeeded(written) ? new Parsed(file, written.getResult().get(), null, List.of())
                    : new Parsed(file, null, problemOf(file, written, line -> line), List.of());
        }
        UnicodeEscapes escapes = UnicodeEscapes.of(file.text());
        LineMap decodedLines = new LineMap(escapes.decoded());
        ParseResult<CompilationUnit> decoded = parser.parse(escapes.decoded());
        if (succeeded(written) && (!succeeded(decoded) || sameTokens(written.getResult().get(), decoded.getResult().get()))) {
            return new Parsed(file, written.getResult().get(), null, List.of());
        }
        if (!succeeded(decoded)) {
            IntUnaryOperator writtenLine = line -> file.lines().line(escapes.written(decodedLines.offset(line, 1)));
            return new Parsed(file, null, problemOf(file, decoded, writtenLine), List.of());
        }
        CompilationUnit unit = decoded.getResult().get();
        unit.walk(node -> node.getRange().ifPresent(range -> node.setRange(writtenRange(range, escapes, decodedLines, file.lines()))));
        return new Parsed(file, unit, null, escapes.spans());
    }

    /** Whether two trees were read from the same kinds of tokens, white space aside. */
    private static boolean sameTokens(CompilationUnit one, CompilationUnit other) {
        Optional<JavaToken> a = firstToken(one);
        Optional<JavaToken> b = firstToken(other);
        while (true) {
            a = skipWhitespace(a);
            b = skipWhitespace(b);
            if (a.isEmpty() || b.isEmpty()) {
                return a.isEmpty() && b.isEmpty();
            }
            if (a.get().getKind() != b.get().getKind()) {
                return false;
            }
            a = a.get().getNextToken();
            b = b.get().getNextToken();
        }
    }

    private static Optional<JavaToken> firstToken(CompilationUnit unit) {
        return unit.getTokenRange().map(range -> range.getBegin().findFirstToken());
    }

    private static Optional<JavaToken> skipWhitespace(Optional<JavaToken> token) {
        Optional<JavaToken> at = token;
        while (at.isPresent() && at.get().getCategory().isWhitespace()) {
            at = at.get().getNextToken();
        }
        return at;
    }

    private static boolean succeeded(ParseResult<CompilationUnit> result) {
        return result.isSuccessful() && result.getResult().isPresent();
    }

    /** The range of the written text that a range of the decoded text was read from. */
    private static Range writtenRange(Range decodedRange, UnicodeEscapes escapes, LineMap decoded, LineMap written) {
        Span span = escapes.written(new Span(decoded.offset(decodedRange.begin.line, decodedRange.begin.column),
                decoded.offset(decodedRange.end.line, decodedRange.end.column) + 1));
        int last = Math.max(span.begin(), span.end() - 1);
        return new Range(new Position(written.line(span.begin()), written.column(span.begin())),
                new Position(written.line(last), written.column(last)));
    }

    private static ParseProblem problemOf(SourceFile file, ParseResult<CompilationUnit> result, IntUnaryOperator writtenLine) {
        Problem first = result.getProblems().isEmpty() ? null : result.getProblems().get(0);
        int line = first == null ? 1 : first.getLocation().map(location -> offendingLine(location.getBegin())).orElse(1);
        String message = first == null ? "does not parse" : shortened(first.getMessage());
        return new ParseProblem(file.path(), writtenLine.applyAsInt(line), message);
    }

    /** The problem's range begins at the last good token; the offending one is the next real token. */
    private static int offendingLine(JavaToken lastGood) {
        JavaToken at = lastGood.getNextToken().orElse(lastGood);
        while (at.getCategory().isWhitespaceOrComment() && at.getNextToken().isPresent()) {
            at = at.getNextToken().get();
        }
        return at.getRange().map(range -> range.begin.line).orElse(1);
    }

    private static String shortened(String message) {
        String line = Text.firstLine(message);
        int list = line.indexOf(", expected one of");
        return list < 0 ? line : line.substring(0, list);
    }

    /** One expression's text as a tree, or empty when it is not an expression on its own. */
    public static Optional<Expression> parseExpression(String text) {
        ParseResult<Expression> parsed = new JavaParser(configuration()).parseExpression(text);
        return parsed.isSuccessful() ? parsed.getResult() : Optional.empty();
    }

    private static ParserConfiguration configuration() {
        return new ParserConfiguration()
                .setLanguageLevel(ParserConfiguration.LanguageLevel.JAVA_17)
                .setTabSize(1)
                .setAttributeComments(false);
    }

}
