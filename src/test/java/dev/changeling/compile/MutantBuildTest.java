package dev.changeling.compile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.github.javaparser.ast.expr.BinaryExpr;
import com.github.javaparser.ast.expr.MethodCallExpr;
import com.github.javaparser.ast.expr.NameExpr;
import com.github.javaparser.ast.expr.VariableDeclarationExpr;
import com.github.javaparser.ast.stmt.ExpressionStmt;
import com.github.javaparser.ast.stmt.ReturnStmt;
import dev.changeling.UserError;
import dev.changeling.mutant.HigherOrder;
import dev.changeling.mutant.HostKind;
import dev.changeling.mutant.Mutant;
import dev.changeling.mutant.Point;
import dev.changeling.operator.MutationOperator;
import dev.changeling.source.SourceFile;
import dev.changeling.source.Span;
import java.io.IOException;
import java.lang.reflect.InvocationTargetException;
import java.net.URLClassLoader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class MutantBuildTest {

    @TempDir
    Path dir;

    private static List<Mutant> firstOrder(List<Point> points) {
        return points.stream().map(Mutant::firstOrder).toList();
    }

    private static Mutant only(List<Point> points, String snippet, String replacement) {
        List<Point> found = points.stream()
                .filter(point -> point.snippet().equals(snippet) && point.replacement().equals(replacement)).toList();
        assertEquals(1, found.size(), "one point " + snippet + " -> " + replacement + " among " + points.size());
        return Mutant.firstOrder(found.get(0));
    }

    private static int count(Map<Placement.Kind, Integer> counts, Placement.Kind kind) {
        return counts.getOrDefault(kind, 0);
    }

    @Nested
    class PureFunctions {

        @Test
        void everyFirstOrderMutant_runsExactlyAsItsOwnFile() {
            TestProject project = TestProject.create(dir, Map.of("sample/Trays.java", Samples.TRAYS));
            List<Point> points = project.guardedPoints("sample/Trays.java", SampleOperators.all());
            List<Mutant> mutants = firstOrder(points);
            BuildResult result = project.build(mutants);

            Map<Placement.Kind, Integer> counts = Equivalence.assertEachMutantRunsAsItsOwnFile(project, result, mutants,
                    "sample.Trays");

            assertTrue(count(counts, Placement.Kind.IN_SCHEMA) >= mutants.size() * 8 / 10,
                    "most mutants share the schema: " + counts + " " + result.timings().summary());
            assertEquals(1, count(counts, Placement.Kind.STILLBORN), "only \"down\" - growth is stillborn: " + counts);
            assertEquals(result.pointCount(), count(counts, Placement.Kind.IN_SCHEMA));
        }

        @Test
        void incrementInAForUpdate_andDeletions_areSwitchedInTheSchema() {
            TestProject project = TestProject.create(dir, Map.of("sample/Trays.java", Samples.TRAYS));
            List<Point> points = project.guardedPoints("sample/Trays.java", SampleOperators.all());
            BuildResult result = project.build(firstOrder(points));

            Mutant forUpdate = only(points.stream().filter(point -> point.member().equals("wateringTotal(int)")).toList(),
                    "i++", "--");
            assertEquals(HostKind.STATEMENT_EXPRESSION, forUpdate.first().kind());
            assertEquals(Placement.Kind.IN_SCHEMA, result.placementOf(forUpdate).kind());
            Mutant deletion = only(points, "box[1]++;", "");
            assertEquals(HostKind.STATEMENT, deletion.first().kind());
            assertEquals(Placement.Kind.IN_SCHEMA, result.placementOf(deletion).kind());
        }

        @Test
        void secondOrderMutants_switchBothPointsAtOnce_exactlyAsTheirOwnFile() {
            TestProject project = TestProject.create(dir, Map.of("sample/Trays.java", Samples.TRAYS));
            List<Point> points = project.guardedPoints("sample/Trays.java", SampleOperators.all());
            List<Mutant> pairs = HigherOrder.combine(points, 2, HigherOrder.Scope.METHOD, 11L);
            BuildResult result = project.build(pairs);

            Map<Placement.Kind, Integer> counts = Equivalence.assertEachMutantRunsAsItsOwnFile(project, result, pairs,
                    "sample.Trays");

            assertTrue(count(counts, Placement.Kind.IN_SCHEMA) >= pairs.size() * 7 / 10, counts.toString());
            pairs.stream().filter(pair -> result.placementOf(pair).kind() == Placement.Kind.IN_SCHEMA)
                    .forEach(pair -> assertEquals(2, result.placementOf(pair).pointIds().size()));
        }

        @Test
        void aPointSharedByMutants_hasOneId() {
            TestProject project = TestProject.create(dir, Map.of("sample/Trays.java", Samples.TRAYS));
            List<Point> points = project.guardedPoints("sample/Trays.java", SampleOperators.all());
            Mutant single = only(points, "width*seeds", "/");
            Mutant partner = only(points, "row<10", "<=");
            Mutant pair = Mutant.ofPoints(List.of(single.first(), partner.first()));
            BuildResult result = project.build(List.of(single, partner, pair));

            int singleId = result.placementOf(single).pointIds().get(0);
            int partnerId = result.placementOf(partner).pointIds().get(0);
            assertEquals(Set.of(singleId, partnerId), Set.copyOf(result.placementOf(pair).pointIds()));
            assertEquals(2, result.pointCount(), "ids are dense: " + result.points());
            assertEquals(singleId, result.idOf(single.first()).orElseThrow());
        }

        @Test
        void schemaSources_keepEveryLineWhereItWas() throws IOException {
            TestProject project = TestProject.create(dir, Map.of("sample/Trays.java", Samples.TRAYS));
            project.build(firstOrder(project.guardedPoints("sample/Trays.java", SampleOperators.all())));

            String schema = Files.readString(project.output.resolve("schema-sources/src/main/java/sample/Trays.java"));
            assertEquals(Samples.TRAYS.lines().count(), schema.lines().count());
            assertTrue(schema.contains("dev.changeling.probe.Probe.pass("), "statement expressions are wrapped");
            assertTrue(schema.lines().anyMatch(line -> line.contains("private static void settle(int[] box) {")));
        }
    }

    @Nested
    class UnicodeEscapesOutsideLiterals {

        /** The sum is written with an escaped plus, which javac decodes before it reads the code (JLS §3.3). */
        private static final String KETTLE = """
                package sample;

                public final class Kettle {

                    private Kettle() {
                    }

                    public static int doubled(int litres) {
                        return litres \\u002B litres;
                    }

                    public static boolean boils(int degrees, int altitude) {
                        return degrees >= 100 - altitude / 300;
                    }
                }
                """;

        @Test
        void aFileWithAnEscapedOperator_isMutatedAroundIt_andEveryMutantRunsAsItsOwnFile() {
            TestProject project = TestProject.create(dir, Map.of("sample/Kettle.java", KETTLE));
            List<Point> points = project.points("sample/Kettle.java", SampleOperators.all());
            List<Mutant> mutants = firstOrder(points);

            assertFalse(points.isEmpty(), "the file is parsed, not skipped");
            points.forEach(point -> assertEquals(13, point.line(), "no point touches the escape: " + point));
            BuildResult result = project.build(mutants);
            Map<Placement.Kind, Integer> counts = Equivalence.assertEachMutantRunsAsItsOwnFile(project, result, mutants,
                    "sample.Kettle");
            assertEquals(mutants.size(), count(counts, Placement.Kind.IN_SCHEMA), counts.toString());
        }
    }

    @Nested
    class Stillborn {

        private final MutationOperator swapOperands = SampleOperators.of("sample-swap", (node, out) -> {
            if (node instanceof BinaryExpr binary && binary.getOperator() == BinaryExpr.Operator.PLUS) {
                out.replaceWhole(binary, out.text(binary.getRight()) + " + " + out.text(binary.getLeft()), "swapped");
            }
        });

        @Test
        void stringMinus_isStillborn_withJavacsFirstError() {
            TestProject project = TestProject.create(dir, Map.of("sample/Labels.java", Samples.LABELS));
            List<Point> points = project.points("sample/Labels.java", List.of(SampleOperators.BINARY));
            Mutant minus = only(points, "left+right", "-");
            BuildResult result = project.build(firstOrder(points));

            Placement placement = result.placementOf(minus);
            assertEquals(Placement.Kind.STILLBORN, placement.kind());
            // javac's own wording (JDK 17 compiler.properties, compiler.err.operator.cant.be.applied.1)
            assertEquals("src/main/java/sample/Labels.java:9: bad operand types for binary operator '-'", placement.detail());
            assertEquals(Placement.Kind.IN_SCHEMA, result.placementOf(only(points, "word.length()+1", "-")).kind());
        }

        @Test
        void errorInOneBranch_movesOnlyThatPoint_notItsHostsOtherPoints() {
            TestProject project = TestProject.create(dir, Map.of("sample/Labels.java", Samples.LABELS));
            List<Point> points = project.points("sample/Labels.java", List.of(SampleOperators.BINARY, swapOperands));
            List<Mutant> mutants = firstOrder(points);
            BuildResult result = project.build(mutants);

            assertEquals(Placement.Kind.STILLBORN, result.placementOf(only(points, "left+right", "-")).kind());
            assertEquals(Placement.Kind.IN_SCHEMA, result.placementOf(only(points, "left+right", "right + left")).kind());
            assertEquals(2, result.timings().schemaRounds());
            Equivalence.assertEachMutantRunsAsItsOwnFile(project, result, mutants, "sample.Labels");
        }

        @Test
        void kOrderMutantWithAStillbornPoint_isStillbornAsAWhole() {
            TestProject project = TestProject.create(dir, Map.of("sample/Labels.java", Samples.LABELS));
            List<Point> points = project.points("sample/Labels.java", List.of(SampleOperators.BINARY));
            Mutant pair = Mutant.ofPoints(List.of(only(points, "left+right", "-").first(),
                    only(points, "word.length()+1", "-").first()));
            BuildResult result = project.build(List.of(pair));

            assertEquals(Placement.Kind.STILLBORN, result.placementOf(pair).kind());
            assertEquals("src/main/java/sample/Labels.java:9: bad operand types for binary operator '-'",
                    result.placementOf(pair).detail());
            assertEquals(0, result.timings().aloneCompiles(), "the schema already showed that the '-' cannot compile");
            Equivalence.assertEachMutantRunsAsItsOwnFile(project, result, List.of(pair), "sample.Labels");
        }
    }

    @Nested
    class LeavingTheSchema {

        private final MutationOperator zeroArgument = SampleOperators.of("sample-zero-argument", (node, out) -> {
            if (node instanceof NameExpr name && name.getParentNode().orElse(null) instanceof MethodCallExpr) {
                out.replaceWhole(name, "0", "passed 0");
            }
        });

        private final MutationOperator deleteReturnsAndDeclarations = SampleOperators.of("sample-delete-more",
                (node, out) -> {
                    if (node instanceof ReturnStmt statement) {
                        out.delete(statement, "removed the return");
                    } else if (node instanceof ExpressionStmt statement
                            && statement.getExpression() instanceof VariableDeclarationExpr) {
                        out.delete(statement, "removed the declaration");
                    }
                });

        @Test
        void narrowingContext_movesTheHostAlone_whereItCompiles() {
            TestProject project = TestProject.create(dir, Map.of("sample/Sacks.java", Samples.SACKS));
            List<Point> points = project.points("sample/Sacks.java", List.of(SampleOperators.LITERALS, SampleOperators.BINARY));
            List<Mutant> mutants = firstOrder(points);
            BuildResult result = project.build(mutants);

            Placement literal = result.placementOf(only(points, "10", "11"));
            assertEquals(Placement.Kind.ALONE, literal.kind());
            assertTrue(literal.detail().contains("javac rejected the switch around it")
                    && literal.detail().contains("lossy conversion"), literal.detail());
            assertTrue(Files.isRegularFile(literal.classes().resolve("sample/Sacks.class")));
            assertEquals(Placement.Kind.IN_SCHEMA, result.placementOf(only(points, "base+more", "-")).kind());
            Equivalence.assertEachMutantRunsAsItsOwnFile(project, result, mutants, "sample.Sacks");
        }

        @Test
        void branchOfAnotherType_compilesAlone_soTheOriginalKeepsItsOverloadAndNulls() {
            TestProject project = TestProject.create(dir, Map.of("sample/Sacks.java", Samples.SACKS));
            List<Point> points = project.points("sample/Sacks.java", List.of(zeroArgument));
            List<Mutant> mutants = firstOrder(points);
            BuildResult result = project.build(mutants);

            // JLS 17 §15.25: int and Integer operands make a numeric conditional, which unboxes the Integer
            Placement zero = result.placementOf(only(points, "count", "0"));
            assertEquals(Placement.Kind.ALONE, zero.kind());
            assertTrue(zero.detail().contains("its type int differs from the original's java.lang.Integer"), zero.detail());
            Equivalence.assertEachMutantRunsAsItsOwnFile(project, result, mutants, "sample.Sacks");
        }

        @Test
        void returnOfAnotherType_inAMethodReturningAReference_staysInTheSchema() {
            TestProject project = TestProject.create(dir, Map.of("sample/Trays.java", Samples.TRAYS));
            List<Point> points = project.guardedPoints("sample/Trays.java", List.of(SampleOperators.RETURNS));
            BuildResult result = project.build(firstOrder(points));

            Mutant nullLabel = only(points, "growth>0?\"up\":growth==0?\"flat\":\"down\"+growth", "null");
            assertEquals(Placement.Kind.IN_SCHEMA, result.placementOf(nullLabel).kind());
            Mutant nullExtra = only(points, "stock==null?more:stock+more", "null");
            assertEquals(Placement.Kind.ALONE, result.placementOf(nullExtra).kind(), "null against int would box");
            Mutant zeroArea = only(points, "side+depth*2", "0");
            assertEquals(Placement.Kind.ALONE, result.placementOf(zeroArea).kind(), "int against long would widen");
        }

        @Test
        void deletionsThatBreakFlowOrScope_areStillborn_andMoveOnlyTheirMembersDeletions() {
            TestProject project = TestProject.create(dir, Map.of("sample/Ledger.java", Samples.LEDGER));
            List<Point> points = project.points("sample/Ledger.java", List.of(deleteReturnsAndDeclarations,
                    SampleOperators.DELETIONS, SampleOperators.BINARY, SampleOperators.COMPOUND, new dev.changeling.operator.RelationalSubset()));
            List<Mutant> mutants = firstOrder(points);
            BuildResult result = project.build(mutants);

            Placement lastReturn = result.placementOf(only(points, "return net;", ""));
            assertEquals(Placement.Kind.STILLBORN, lastReturn.kind());
            assertEquals("src/main/java/sample/Ledger.java:14: missing return statement", lastReturn.detail());
            Placement declaration = result.placementOf(only(points, "int fee=amount/10;", ""));
            assertEquals(Placement.Kind.STILLBORN, declaration.kind());
            assertTrue(declaration.detail().contains("cannot find symbol"), declaration.detail());
            assertEquals(Placement.Kind.ALONE, result.placementOf(only(points, "return 0;", "")).kind(),
                    "a deletion beside the culprit moves with it");
            Placement rate = result.placementOf(only(points, "rate=amount>100?20:10;", ""));
            assertEquals("src/main/java/sample/Ledger.java:27: variable rate might not have been initialized", rate.detail());
            Placement mark = result.placementOf(only(points, "mark(seen);", ""));
            assertEquals(Placement.Kind.IN_SCHEMA, mark.kind(),
                    "an error at a use of a variable moves only the deletions that set it: " + mark.detail());
            for (Point point : points) {
                if (point.kind() != HostKind.STATEMENT) {
                    Placement placement = result.placementOf(Mutant.firstOrder(point));
                    assertEquals(Placement.Kind.IN_SCHEMA, placement.kind(),
                            point.snippet() + " -> " + point.replacement() + ": " + placement.detail());
                }
            }
            Equivalence.assertEachMutantRunsAsItsOwnFile(project, result, mutants, "sample.Ledger");
        }

        @Test
        void mutantsOfSeveralFiles_compileAloneInSharedTasks_eachIntoItsOwnFolder() throws IOException {
            TestProject project = TestProject.create(dir, Map.of("sample/Sacks.java", Samples.SACKS,
                    "sample/Ledger.java", Samples.LEDGER));
            List<Point> sacks = project.points("sample/Sacks.java", List.of(SampleOperators.LITERALS));
            List<Point> ledger = project.points("sample/Ledger.java", List.of(deleteReturnsAndDeclarations));
            Mutant narrowed = only(sacks, "10", "11");
            Mutant early = only(ledger, "return 0;", "");
            Mutant noReturn = only(ledger, "return net;", "");
            BuildResult result = project.build(List.of(narrowed, early, noReturn));

            assertEquals(Placement.Kind.ALONE, result.placementOf(narrowed).kind());
            assertEquals(Placement.Kind.ALONE, result.placementOf(early).kind());
            assertEquals(Placement.Kind.STILLBORN, result.placementOf(noReturn).kind());
            assertEquals(3, result.timings().aloneCompiles());
            assertTrue(result.timings().aloneTasks() < 3, result.timings().summary());
            try (var walk = Files.walk(result.placementOf(narrowed).classes())) {
                assertEquals(List.of("Sacks.class"), walk.filter(Files::isRegularFile)
                        .map(path -> path.getFileName().toString()).toList());
            }
            Equivalence.assertEachMutantRunsAsItsOwnFile(project, result, List.of(narrowed), "sample.Sacks");
            Equivalence.assertEachMutantRunsAsItsOwnFile(project, result, List.of(early, noReturn), "sample.Ledger");
        }

        @Test
        void errorFarFromEveryHost_movesTheWholeFile() {
            TestProject project = TestProject.create(dir, Map.of("sample/Seasons.java", Samples.SEASONS));
            SourceFile file = project.file("sample/Seasons.java");
            List<Point> points = new ArrayList<>(project.points("sample/Seasons.java",
                    List.of(new dev.changeling.operator.RelationalSubset())));
            points.add(byHand(file, "2 + 4", "+", "-"));
            List<Mutant> mutants = firstOrder(points);
            BuildResult result = project.build(mutants);

            for (Mutant mutant : mutants) {
                assertEquals(Placement.Kind.ALONE, result.placementOf(mutant).kind(), Equivalence.describe(mutant));
            }
            assertEquals(0, result.pointCount());
            Equivalence.assertEachMutantRunsAsItsOwnFile(project, result, mutants, "sample.Seasons");
        }

        @Test
        void hostsOverlappingWithoutNesting_compileAlone() {
            TestProject project = TestProject.create(dir, Map.of("sample/Trays.java", Samples.TRAYS));
            SourceFile file = project.file("sample/Trays.java");
            Point left = byHand(file, "width * seeds", "*", "/");
            Point right = byHand(file, "seeds + (width", "+", "-");
            List<Mutant> mutants = firstOrder(List.of(left, right));
            BuildResult result = project.build(mutants);

            assertEquals(Placement.Kind.IN_SCHEMA, result.placementOf(mutants.get(0)).kind());
            assertEquals(Placement.Kind.ALONE, result.placementOf(mutants.get(1)).kind());
            assertTrue(result.placementOf(mutants.get(1)).detail().contains("overlaps"));
        }

        private Point byHand(SourceFile file, String host, String edit, String replacement) {
            int hostBegin = file.text().indexOf(host);
            int editBegin = file.text().indexOf(edit, hostBegin);
            return new Point(file.path(), "Sample", "member", "by-hand", HostKind.EXPRESSION,
                    new Span(hostBegin, hostBegin + host.length()), new Span(editBegin, editBegin + edit.length()),
                    replacement, host, "by hand", file.lines().line(hostBegin), false, "by-hand-" + host);
        }
    }

    @Nested
    class LambdaBodies {

        @Test
        void voidValueAndOverloadedLambdaBodies_stayInTheSchema_andMeanWhatTheirFilesMean() {
            TestProject project = TestProject.create(dir, Map.of("sample/Sprinklers.java", Samples.SPRINKLERS));
            List<Point> points = project.points("sample/Sprinklers.java", SampleOperators.all());
            List<Mutant> mutants = firstOrder(points);
            BuildResult result = project.build(mutants);

            for (String[] body : new String[][] {{"box[0]++", "--"}, {"x*2+a", "-"}, {"v>limit", ">="},
                    {"count[0]+=n", "-="}}) {
                Placement placement = result.placementOf(only(points, body[0], body[1]));
                assertEquals(Placement.Kind.IN_SCHEMA, placement.kind(), body[0] + ": " + placement.detail());
            }
            Placement bodyDeleted = result.placementOf(only(points, "count[0]+=n", ""));
            assertEquals(Placement.Kind.STILLBORN, bodyDeleted.kind(), "a lambda's expression body is no statement to delete");
            Equivalence.assertEachMutantRunsAsItsOwnFile(project, result, mutants, "sample.Sprinklers");
        }
    }

    @Nested
    class SwitchRules {

        @Test
        void armsOfSwitchesAndBodiesWithoutBraces_runExactlyAsTheirOwnFiles() {
            TestProject project = TestProject.create(dir, Map.of("sample/Months.java", Samples.SEASONS_SWITCH));
            List<Point> points = project.points("sample/Months.java", SampleOperators.all());
            List<Mutant> mutants = firstOrder(points);
            BuildResult result = project.build(mutants);

            Map<Placement.Kind, Integer> counts = Equivalence.assertEachMutantRunsAsItsOwnFile(project, result, mutants,
                    "sample.Months");
            assertTrue(count(counts, Placement.Kind.IN_SCHEMA) >= mutants.size() / 2, counts.toString());
            assertEquals(Placement.Kind.IN_SCHEMA, result.placementOf(only(points, "month*10", "/")).kind());
            assertEquals(Placement.Kind.STILLBORN, result.placementOf(only(points, "out+=\"fizz\";", "")).kind(),
                    "an arrow case with its body deleted does not parse");
            assertEquals(Placement.Kind.IN_SCHEMA, result.placementOf(only(points, "out=\"none\";", "")).kind(),
                    "a deletion inside the arrow case's block is fine");
            Placement unbraced = result.placementOf(only(points, "b++;", ""));
            assertEquals(Placement.Kind.ALONE, unbraced.kind(), "its own file makes c++ the if's body: " + unbraced);
        }
    }

    @Nested
    class LoopConditionSwitches {

        @Test
        void conditionBecomingConstantFalse_isStillborn_asJavacFindsTheBodyUnreachable() {
            TestProject project = TestProject.create(dir, Map.of("sample/Ladders.java", Samples.LADDERS));
            // The operators never propose a constant loop condition; the build still guards against one made by hand.
            List<Point> points = project.points("sample/Ladders.java", List.of(new dev.changeling.operator.RelationalSubset()));
            List<Mutant> mutants = List.of(Mutant.firstOrder(LoopPoints.constant(project.file("sample/Ladders.java"), "left > 0", "false")),
                    only(points, "left>0", ">="));
            BuildResult result = project.build(mutants);

            Placement never = result.placementOf(mutants.get(0));
            assertEquals(Placement.Kind.STILLBORN, never.kind());
            assertEquals("src/main/java/sample/Ladders.java:10: unreachable statement", never.detail());
            assertEquals(Placement.Kind.IN_SCHEMA, result.placementOf(mutants.get(1)).kind());
            Equivalence.assertEachMutantRunsAsItsOwnFile(project, result, mutants, "sample.Ladders");
        }

        @Test
        void constantConditionMadeVariable_leavesTheSchemaAtOnce_withoutDisturbingItsMember() {
            TestProject project = TestProject.create(dir, Map.of("sample/Ladders.java", Samples.LADDERS));
            List<Point> points = project.points("sample/Ladders.java", List.of(new dev.changeling.operator.RelationalSubset()));
            Mutant loopForEver = Mutant.firstOrder(LoopPoints.constant(project.file("sample/Ladders.java"), "true", "false"));
            Mutant higher = only(points, "x>3", ">=");
            BuildResult result = project.build(List.of(loopForEver, higher));

            assertEquals(Placement.Kind.STILLBORN, result.placementOf(loopForEver).kind());
            assertEquals(Placement.Kind.IN_SCHEMA, result.placementOf(higher).kind());
            Equivalence.assertEachMutantRunsAsItsOwnFile(project, result, List.of(loopForEver, higher), "sample.Ladders");
        }

        @Test
        void constantText_isLiteralsAndOperatorsOnly() {
            assertTrue(dev.changeling.compile.LoopConditionSwitches.constant("false"));
            assertTrue(dev.changeling.compile.LoopConditionSwitches.constant("(1 < 2L) && !true"));
            assertFalse(dev.changeling.compile.LoopConditionSwitches.constant("i < 10"));
            assertFalse(dev.changeling.compile.LoopConditionSwitches.constant("x1 > 0"));
            assertFalse(dev.changeling.compile.LoopConditionSwitches.constant("\"a\".isEmpty()"));
        }
    }

    @Nested
    class OncePerJvm {

        @Test
        void staticInitialiserPoint_isLeftOut_andNotInTheSchema() throws IOException {
            TestProject project = TestProject.create(dir, Map.of("sample/Limits.java", Samples.LIMITS));
            List<Point> points = project.points("sample/Limits.java", List.of(SampleOperators.BINARY));
            BuildResult result = project.build(firstOrder(points));

            Placement ceiling = result.placementOf(only(points, "3+4", "-"));
            assertEquals(Placement.Kind.ONCE_PER_JVM, ceiling.kind());
            assertTrue(ceiling.detail().contains("once per JVM"));
            assertEquals(Placement.Kind.IN_SCHEMA, result.placementOf(only(points, "ceiling-used", "+")).kind());
            assertEquals(1, result.pointCount());
            String schema = Files.readString(project.output.resolve("schema-sources/src/main/java/sample/Limits.java"));
            assertTrue(schema.contains("static int ceiling = 3 + 4;"), schema);
        }
    }

    @Nested
    class TextFidelity {

        private static final String CLASS = "sample.Beete";

        @Test
        void unicodeAndCrlfFile_runsExactlyAsItsMutants() {
            String crlf = Samples.BEDS.replace("\n", "\r\n");
            TestProject project = TestProject.create(dir, Map.of("sample/Beete.java", crlf));
            List<Point> points = project.points("sample/Beete.java", SampleOperators.all());
            List<Mutant> mutants = firstOrder(points);
            BuildResult result = project.build(mutants);

            Map<Placement.Kind, Integer> counts = Equivalence.assertEachMutantRunsAsItsOwnFile(project, result, mutants,
                    CLASS);
            assertTrue(count(counts, Placement.Kind.IN_SCHEMA) >= 10, counts.toString());
        }

        @Test
        void lineNumbersAfterAMultiLineHost_matchTheOriginal() throws Exception {
            String crlf = Samples.BEDS.replace("\n", "\r\n");
            TestProject project = TestProject.create(dir, Map.of("sample/Beete.java", crlf));
            List<Point> points = project.points("sample/Beete.java", List.of(SampleOperators.BINARY));
            BuildResult result = project.build(firstOrder(points));
            assertTrue(result.pointCount() >= 2, "the three-line host has points");

            try (URLClassLoader schema = project.loader(result.schemaClasses());
                 URLClassLoader original = project.loader(project.classes)) {
                assertEquals(throwingLine(original), throwingLine(schema));
            }
        }

        private int throwingLine(ClassLoader loader) throws ReflectiveOperationException {
            try {
                loader.loadClass(CLASS).getMethod("fläche", int.class, int.class).invoke(null, 9, 9);
            } catch (InvocationTargetException e) {
                return e.getCause().getStackTrace()[0].getLineNumber();
            }
            throw new AssertionError("fläche(9, 9) should throw");
        }
    }

    @Nested
    class Output {

        @Test
        void classNames_listEveryClassOfTheSchema_nestedAndAnonymousToo() {
            TestProject project = TestProject.create(dir, Map.of("sample/Sheds.java", Samples.SHEDS,
                    "sample/Limits.java", Samples.LIMITS));
            List<Point> points = project.points("sample/Sheds.java", List.of(SampleOperators.BINARY));
            BuildResult result = project.build(firstOrder(points));

            assertEquals(List.of("sample.Sheds", "sample.Sheds$1", "sample.Sheds$Shelf"), result.schemaClassNames());
            for (String name : result.schemaClassNames()) {
                assertTrue(Files.isRegularFile(result.schemaClasses().resolve(name.replace('.', '/') + ".class")), name);
            }
            assertFalse(Files.exists(result.schemaClasses().resolve("sample/Limits.class")), "files without points stay out");
        }

        @Test
        void rebuild_replacesEarlierOutput() throws IOException {
            TestProject project = TestProject.create(dir, Map.of("sample/Sheds.java", Samples.SHEDS,
                    "sample/Labels.java", Samples.LABELS));
            project.build(firstOrder(project.points("sample/Labels.java", List.of(SampleOperators.BINARY))));
            BuildResult second = project.build(firstOrder(project.points("sample/Sheds.java", List.of(SampleOperators.BINARY))));

            try (var walk = Files.walk(second.schemaClasses())) {
                Set<String> classes = walk.filter(Files::isRegularFile).map(path -> path.getFileName().toString())
                        .collect(Collectors.toSet());
                assertEquals(Set.of("Sheds.class", "Sheds$1.class", "Sheds$Shelf.class"), classes);
            }
        }

        @Test
        void timings_areRecorded() {
            TestProject project = TestProject.create(dir, Map.of("sample/Sacks.java", Samples.SACKS));
            BuildResult result = project.build(firstOrder(project.points("sample/Sacks.java", List.of(SampleOperators.LITERALS))));

            BuildTimings timings = result.timings();
            assertEquals(1, timings.schemaRounds(), "the only point left, so nothing was compiled again");
            assertEquals(1, timings.aloneCompiles());
            assertTrue(timings.compileMillis() > 0 && timings.fallbackMillis() > 0, timings.summary());
            assertTrue(timings.summary().startsWith("render "), timings.summary());
        }
    }

    @Nested
    class Misuse {

        @Test
        void classpathWithoutTheProbe_isRefused() {
            TestProject project = TestProject.create(dir, Map.of("sample/Labels.java", Samples.LABELS));
            List<Mutant> mutants = firstOrder(project.points("sample/Labels.java", List.of(SampleOperators.BINARY)));
            BuildRequest request = new BuildRequest(mutants, project.files, List.of(project.classes), project.output);

            IllegalArgumentException refused = assertThrows(IllegalArgumentException.class, () -> MutantBuild.compile(request));
            assertTrue(refused.getMessage().contains("dev.changeling.probe.Probe"), refused.getMessage());
        }

        @Test
        void classpathWithoutTheProjectsClasses_isAUserErrorNotAPileOfStillborns() {
            TestProject project = TestProject.create(dir, Map.of("sample/Paths.java", Samples.PATHS,
                    "sample/Limits.java", Samples.LIMITS));
            List<Mutant> mutants = firstOrder(project.points("sample/Paths.java", List.of(SampleOperators.BINARY)));
            BuildRequest request = new BuildRequest(mutants, project.files, List.of(project.probe), project.output);

            UserError error = assertThrows(UserError.class, () -> MutantBuild.compile(request));
            assertTrue(error.getMessage().startsWith("src/main/java/sample/Paths.java:9: cannot find symbol"), error.getMessage());
        }

        @Test
        void changeOutsideItsHost_isRefused() {
            TestProject project = TestProject.create(dir, Map.of("sample/Labels.java", Samples.LABELS));
            Point point = project.points("sample/Labels.java", List.of(SampleOperators.BINARY)).get(0);
            Point astray = new Point(point.file(), point.type(), point.member(), point.operator(), point.kind(),
                    point.host(), new Span(point.host().end(), point.host().end() + 1), "-", point.snippet(),
                    point.description(), point.line(), false, point.fingerprint());
            assertThrows(IllegalArgumentException.class, () -> new BuildRequest(List.of(Mutant.firstOrder(astray)),
                    project.files, project.classpath(), project.output));
        }

        @Test
        void mutantOfAFileNotGiven_isRefused() {
            TestProject project = TestProject.create(dir, Map.of("sample/Labels.java", Samples.LABELS));
            List<Mutant> mutants = firstOrder(project.points("sample/Labels.java", List.of(SampleOperators.BINARY)));
            assertThrows(IllegalArgumentException.class,
                    () -> new BuildRequest(mutants, Map.of(), project.classpath(), project.output));
        }
    }

    @Test
    void noMutants_giveAnEmptySchema() {
        TestProject project = TestProject.create(dir, Map.of("sample/Labels.java", Samples.LABELS));
        BuildResult result = project.build(List.of());

        assertEquals(0, result.pointCount());
        assertEquals(List.of(), result.schemaClassNames());
        assertNotNull(result.schemaClasses());
        assertTrue(Files.isDirectory(result.schemaClasses()));
        assertEquals(0, result.timings().schemaRounds());
        assertEquals("", new String(new byte[0], StandardCharsets.UTF_8));
    }
}
