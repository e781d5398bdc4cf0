package dev.changeling.source;

import static org.junit.jupiter.api.Assertions.assertEquals;

import com.github.javaparser.ast.expr.BinaryExpr;
import org.junit.jupiter.api.Test;

class LineMapTest {

    @Test
    void countsLinesLikeJavaParserForEveryLineEnding() {
        LineMap lines = new LineMap("a\nb\r\nc\rd");
        assertEquals(4, lines.lineCount());
        assertEquals(1, lines.line(0));
        assertEquals(2, lines.line(2));
        assertEquals(3, lines.line(5));
        assertEquals(4, lines.line(7));
        assertEquals(7, lines.offset(4, 1));
        assertEquals(1, lines.column(7));
    }

    @Test
    void spansOfNodesMatchTheirTextWithTabsCrlfAndSupplementaryCharacters() {
        String text = "class T {\r\n\tboolean f(int a, int b) {\r\n\t\tString s = \"\uD83C\uDF31\u00e9\"; return a <\tb;\r\n\t}\r\n}\r\n";
        JavaSources.Parsed parsed = JavaSources.parse(SourceFile.of("T.java", text));
        BinaryExpr comparison = parsed.unit().findFirst(BinaryExpr.class).orElseThrow();
        assertEquals("a <\tb", parsed.file().textOf(comparison));
        assertEquals(3, parsed.file().lineOf(parsed.file().spanOf(comparison)));
    }

    @Test
    void aFileThatDoesNotParseIsAProblemWithItsLine() {
        JavaSources.Parsed parsed = JavaSources.parse(SourceFile.of("src/Broken.java", "class Broken {\n  void f() {\n    int = 3;\n  }\n}\n"));
        assertEquals(false, parsed.ok());
        assertEquals("src/Broken.java", parsed.problem().path());
        assertEquals(3, parsed.problem().line());
    }
}
