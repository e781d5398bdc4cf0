package dev.changeling.operator;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.mutant.HostKind;
import dev.changeling.mutant.Point;
import dev.changeling.source.JavaSources;
import dev.changeling.source.SourceFile;
import dev.changeling.source.Span;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

/** All registered operators together on files that stress positions and newer syntax. */
class OperatorsTest {

    /** What the original text at a point's edit must be, read from its description. */
    private static final Map<String, String> REMOVED_TOKENS = Map.of(
            "removed the !", "!", "removed the unary minus", "-", "removed the ~", "~");

    /**
     * Runs every operator on {@code source} and checks that each mutant lands on the text it names:
     * the edit's original text is the token the description names (or the whole host contains it),
     * and the mutated file parses again. Returns the points for further checks.
     */
    private static List<Point> landOnTheirText(String source) {
        List<Point> points = Mutate.points(source, Operators.all());
        assertFalse(points.isEmpty(), "no mutants at all");
        for (Point point : points) {
            String edited = source.substring(point.edit().begin(), point.edit().end());
            String hostText = source.substring(point.host().begin(), point.host().end());
            String description = point.description();
            String where = point.operator() + " at line " + point.line() + ": " + description + " in '" + hostText + "'";
            if (REMOVED_TOKENS.containsKey(description)) {
                assertEquals(REMOVED_TOKENS.get(description), edited, where);
            } else if (description.startsWith("replaced ") && !description.startsWith("replaced the ")) {
                String from = description.substring("replaced ".length(), description.indexOf(" with "));
                boolean whole = point.edit().equals(point.host());
                assertTrue(whole ? hostText.contains(from) : edited.equals(from), where + " edits '" + edited + "'");
            } else {
                assertEquals(point.host(), point.edit(), where + " replaces its whole host");
            }
            String mutated = Mutate.applied(point, source);
            assertTrue(JavaSources.parse(SourceFile.of(Mutate.PATH, mutated)).ok(), where + " does not parse:\n" + mutated);
        }
        return points;
    }

    private static List<String> lines(String source, MutationOperator operator) {
        return Mutate.lines(source, operator);
    }

    @Nested
    class Positions {

        @Test
        void crlfLineEndsAndTabs_putTheEditOnTheOperator() {
            String source = "class Crlf {\r\n\tint f(int a, int b) {\r\n\t\tint c = a\t*\tb;\r\n\t\treturn a + c;\r\n\t}\r\n}\r\n";
            List<Point> points = landOnTheirText(source);
            assertEquals(List.of("a*b => a+b", "a*b => a-b", "a*b => a/b", "a*b => a%b",
                    "a+c => a-c", "a+c => a*c", "a+c => a/c", "a+c => a%c"), lines(source, new ArithmeticSwap()));
            Point first = points.stream().filter(point -> point.operator().equals("arithmetic-swap")).findFirst().orElseThrow();
            assertEquals(3, first.line());
            assertEquals(new Span(source.indexOf('*'), source.indexOf('*') + 1), first.edit());
            assertTrue(Mutate.applied(first, source).contains("\t\tint c = a\t+\tb;\r\n"));
        }

        @Test
        void loneCarriageReturns_countAsLineEnds() {
            String source = "class Cr {\r    int f(int a) {\r        return a - 1;\r    }\r}\r";
            landOnTheirText(source);
            Point minus = Mutate.points(source, new ArithmeticSwap()).get(0);
            assertEquals(3, minus.line());
            assertEquals("-", source.substring(minus.edit().begin(), minus.edit().end()));
        }

        @Test
        void aSupplementaryCharacterBeforeTheSite_onTheSameLine_doesNotShiftTheEdit() {
            String source = """
                    class Sprout {
                        String label(int a, int b) {
                            String s = "\uD83C\uDF31 é"; int n = a - b; return s + n;
                        }
                    }
                    """;
            landOnTheirText(source);
            Point minus = Mutate.points(source, new ArithmeticSwap()).get(0);
            assertEquals("-", source.substring(minus.edit().begin(), minus.edit().end()));
            assertEquals("a - b", source.substring(minus.host().begin(), minus.host().end()));
            Point string = Mutate.points(source, new StringLiteralBlank()).get(0);
            assertEquals("\"\uD83C\uDF31 é\"", source.substring(string.edit().begin(), string.edit().end()));
        }

        @Test
        void aTextBlockBeforeTheSite_isSteppedOverLineByLine() {
            String source = """
                    class Label {
                        String text(int a, int b) {
                            String head = \"""
                                Bed
                                  rows\""" + (a * b);
                            return head + " " + (a % b);
                        }
                    }
                    """;
            landOnTheirText(source);
            assertEquals(List.of("a*b => a+b", "a*b => a-b", "a*b => a/b", "a*b => a%b",
                    "a%b => a+b", "a%b => a-b", "a%b => a*b", "a%b => a/b"), lines(source, new ArithmeticSwap()));
        }
    }

    @Nested
    class ModernSyntax {

        @Test
        void records_compactConstructorsAndAccessors() {
            String source = """
                    record Bed(int rows, int columns) {
                        Bed {
                            if (rows < 0) {
                                throw new IllegalArgumentException("rows");
                            }
                        }

                        int area() {
                            return rows * columns;
                        }
                    }
                    """;
            landOnTheirText(source);
            assertEquals(List.of("rows<0 => rows<=0", "rows<0 => rows!=0", "rows<0 => false"),
                    lines(source, new RelationalSubset()));
            assertEquals(List.of("rows*columns => 0"), lines(source, new ReturnValueBlank()));
        }

        @Test
        void switchExpressions_mutateTheArmsButNotTheLabels() {
            String source = """
                    class Season {
                        int weeks(int month, int extra) {
                            return switch (month) {
                                case 1, 2 -> extra + 4;
                                case 3 -> {
                                    int base = 5;
                                    yield base - extra;
                                }
                                default -> 0;
                            };
                        }
                    }
                    """;
            landOnTheirText(source);
            assertEquals(List.of("extra+4 => extra-4", "extra+4 => extra*4", "extra+4 => extra/4", "extra+4 => extra%4",
                    "base-extra => base+extra", "base-extra => base*extra", "base-extra => base/extra",
                    "base-extra => base%extra"), lines(source, new ArithmeticSwap()));
            assertEquals(List.of("4 => 5", "4 => 3", "4 => 0", "5 => 6", "5 => 4", "5 => 0", "0 => 1", "0 => -1"),
                    lines(source, new IntegerLiteralNudge()));
        }

        @Test
        void sealedTypes_andPatternMatching() {
            String source = """
                    sealed interface Crop permits Kale, Bean {
                    }

                    final class Kale implements Crop {
                        int leaves(int rows) {
                            return rows * 12;
                        }
                    }

                    non-sealed class Bean implements Crop {
                        boolean tall(Object other) {
                            return other instanceof Bean bean && bean != this;
                        }
                    }
                    """;
            landOnTheirText(source);
            assertEquals(List.of("rows*12 => rows+12", "rows*12 => rows-12", "rows*12 => rows/12", "rows*12 => rows%12"),
                    lines(source, new ArithmeticSwap()));
            assertEquals(List.of(), lines(source, new ConnectiveSwap()));
        }
    }

    @Nested
    class HostKinds {

        @Test
        /** The schema wraps such hosts in Probe.pass, which hands the value back: right for void and value lambdas alike. */
        void theBodyOfAnExpressionLambda_isSwitchedLikeAStatementExpression() {
            String source = """
                    import java.util.function.IntUnaryOperator;

                    class Doubler {
                        IntUnaryOperator twice() {
                            return n -> n * 2;
                        }

                        void count(int n) {
                            n += 2;
                        }
                    }
                    """;
            List<Point> points = Mutate.points(source, new ArithmeticSwap());
            assertEquals(List.of(HostKind.STATEMENT_EXPRESSION, HostKind.STATEMENT_EXPRESSION, HostKind.STATEMENT_EXPRESSION,
                    HostKind.STATEMENT_EXPRESSION, HostKind.STATEMENT_EXPRESSION, HostKind.STATEMENT_EXPRESSION, HostKind.STATEMENT_EXPRESSION,
                    HostKind.STATEMENT_EXPRESSION), points.stream().map(Point::kind).toList());
        }
    }

    @Nested
    class Registry {

        @Test
        void defaultsComeFirst_andEveryIdIsKnownByName() {
            List<MutationOperator> all = Operators.all();
            assertEquals(Operators.defaults(), all.subList(0, Operators.defaults().size()));
            for (MutationOperator operator : all) {
                assertEquals(operator, Operators.byId(operator.id()).orElseThrow());
            }
        }

        @Test
        void anUnknownId_namesTheKnownOnes() {
            IllegalArgumentException thrown = assertThrows(IllegalArgumentException.class,
                    () -> Operators.named(List.of("arithmetic-swap", "no-such-swap")));
            assertTrue(thrown.getMessage().startsWith("unknown operator 'no-such-swap'; known operators: relational-subset, "),
                    thrown.getMessage());
        }
    }
}
