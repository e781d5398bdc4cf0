package dev.changeling.source;

import dev.changeling.Text;
import com.github.javaparser.JavaParser;
import com.github.javaparser.JavaToken;
import com.github.javaparser.ParseResult;
import com.github.javaparser.ParserConfiguration;
import com.github.javaparser.Problem;
import com.github.javaparser.ast.CompilationUnit;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

/** Reads and parses Java files at language level 17 with the tab size fixed at 1 for offset arithmetic. */
public final class JavaSources {

    private JavaSources() {
    }

    /** The outcome of parsing one file: a tree or a problem, never both. */
    public record Parsed(SourceFile file, CompilationUnit unit, ParseProblem problem) {
        public boolean ok() {
            return unit != null;
        }
    }

    public static SourceFile read(Path projectRoot, Path file) throws IOException {
        String text = Files.readString(file, StandardCharsets.UTF_8);
        return SourceFile.of(projectRoot.relativize(file).toString(), text);
    }

    public static Parsed parse(SourceFile file) {
        JavaParser parser = new JavaParser(configuration());
        ParseResult<CompilationUnit> result = parser.parse(file.text());
        Optional<CompilationUnit> unit = result.getResult();
        if (result.isSuccessful() && unit.isPresent()) {
            return new Parsed(file, unit.get(), null);
        }
        Problem first = result.getProblems().isEmpty() ? null : result.getProblems().get(0);
        int line = first == null ? 1 : first.getLocation().map(location -> offendingLine(location.getBegin())).orElse(1);
        String message = first == null ? "does not parse" : shortened(first.getMessage());
        return new Parsed(file, null, new ParseProblem(file.path(), line, message));
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

    private static ParserConfiguration configuration() {
        return new ParserConfiguration()
                .setLanguageLevel(ParserConfiguration.LanguageLevel.JAVA_17)
                .setTabSize(1)
                .setAttributeComments(false);
    }

}
