package dev.changeling.source;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.body.MethodDeclaration;
import com.github.javaparser.ast.expr.BinaryExpr;
import com.github.javaparser.ast.expr.StringLiteralExpr;
import com.github.javaparser.ast.stmt.ReturnStmt;
import java.util.List;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

class UnicodeEscapesTest {

    @Nested
    class Decoding {

        @Test
        void anEscapeIsOneCharacter_andItsSpanIsTheWholeEscape() {
            UnicodeEscapes escapes = UnicodeEscapes.of("a \\u002B b");
            assertEquals("a + b", escapes.decoded());
            assertEquals(List.of(new Span(2, 8)), escapes.spans());
            assertEquals(new Span(2, 8), escapes.written(new Span(2, 3)));
            assertEquals(new Span(0, 10), escapes.written(new Span(0, 5)));
        }

        @Test
        void severalUs_makeOneEscape() {
            // JLS §3.3: UnicodeMarker is u {u}
            assertEquals("A", UnicodeEscapes.of("\\uuu0041").decoded());
        }

        @Test
        void aBackslashAfterAnOddNumberOfBackslashes_beginsNoEscape() {
            // JLS §3.3: two backslashes then u2122 hold no Unicode escape, the first backslash escapes the second
            UnicodeEscapes escapes = UnicodeEscapes.of("\"\\\\u2122\"");
            assertFalse(escapes.any());
            assertEquals("\"\\\\u2122\"", escapes.decoded());
            assertTrue(UnicodeEscapes.of("\\\\\\u2122").any(), "three backslashes: the third begins one");
        }

        @Test
        void anEscapedBackslash_beginsNoFurtherEscape() {
            // JLS §3.3: an escaped backslash followed by u005a decodes to six characters, not to Z
            assertEquals("\\u005a", UnicodeEscapes.of("\\u005cu005a").decoded());
        }

        @Test
        void aMalformedEscape_staysAsWritten() {
            UnicodeEscapes escapes = UnicodeEscapes.of("\\u12G4 \\u12");
            assertFalse(escapes.any());
            assertEquals("\\u12G4 \\u12", escapes.decoded());
        }
    }

    @Nested
    class Parsing {

        private static final String DOUBLER = """
                class Doubler {
                    int twice(int x) {
                        return x \\u002B x;
                    }

                    boolean small(int x) {
                        return x < 10;
                    }
                }
                """;

        @Test
        void anEscapedOperatorOutsideLiterals_parses_withRangesOfTheWrittenText() {
            SourceFile file = SourceFile.of("Doubler.java", DOUBLER);
            JavaSources.Parsed parsed = JavaSources.parse(file);

            assertTrue(parsed.ok(), () -> String.valueOf(parsed.problem()));
            List<BinaryExpr> binaries = parsed.unit().findAll(BinaryExpr.class);
            assertEquals("x \\u002B x", file.textOf(binaries.get(0)));
            assertEquals("x < 10", file.textOf(binaries.get(1)));
            assertEquals(7, file.lineOf(file.spanOf(binaries.get(1))));
            for (Node node : parsed.unit().findAll(Node.class)) {
                String decoded = UnicodeEscapes.of(file.textOf(node)).decoded();
                assertEquals(node.toString().replaceAll("\\s+", ""), decoded.replaceAll("\\s+", ""),
                        "the written text of every node decodes to the node");
            }
        }

        @Test
        void onlyNodesHoldingTheEscape_touchIt() {
            JavaSources.Parsed parsed = JavaSources.parse(SourceFile.of("Doubler.java", DOUBLER));
            List<MethodDeclaration> methods = parsed.unit().findAll(MethodDeclaration.class);
            assertTrue(parsed.touchesDecodedEscape(parsed.file().spanOf(methods.get(0).findFirst(ReturnStmt.class).get())));
            assertFalse(parsed.touchesDecodedEscape(parsed.file().spanOf(methods.get(1))));
        }

        @Test
        void anEscapedLineEnd_movesTheFollowingCode_toItsWrittenLine() {
            // JLS §3.3 decodes before lines are found (§3.4): the escaped line feed ends the comment, and the sum is code
            String text = "class Lamp {\n    int on() {\n        // off \\u000A return 1 + 2;\n    }\n}\n";
            SourceFile file = SourceFile.of("Lamp.java", text);
            JavaSources.Parsed parsed = JavaSources.parse(file);

            assertTrue(parsed.ok(), () -> String.valueOf(parsed.problem()));
            BinaryExpr sum = parsed.unit().findFirst(BinaryExpr.class).orElseThrow();
            assertEquals("1 + 2", file.textOf(sum));
            assertEquals(3, file.lineOf(file.spanOf(sum)));
            assertFalse(parsed.touchesDecodedEscape(file.spanOf(sum)));
        }

        @Test
        void aFileThatParsesAsWritten_isNotDecoded_soEscapesInLiteralsStayMutable() {
            SourceFile file = SourceFile.of("Sign.java", "class Sign { String s = \"\\u0041\"; }\n");
            JavaSources.Parsed parsed = JavaSources.parse(file);

            assertEquals(List.of(), parsed.decodedEscapes());
            assertEquals("\"\\u0041\"", file.textOf(parsed.unit().findFirst(StringLiteralExpr.class).orElseThrow()));
        }

        @Test
        void aFileBrokenBesidesItsEscape_isStillAProblem_atTheLineOfTheWrittenText() {
            JavaSources.Parsed parsed = JavaSources.parse(SourceFile.of("Bad.java",
                    "class Bad {\n  int f(int x) {\n    return x \\u002B x;\n    int = 3;\n  }\n}\n"));
            assertFalse(parsed.ok());
            assertEquals(4, parsed.problem().line(), parsed.problem().toString());
        }
    }
}
