package dev.changeling.operator;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.github.javaparser.ast.body.TypeDeclaration;
import dev.changeling.mutant.Point;
import dev.changeling.source.JavaSources;
import dev.changeling.source.SourceFile;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;

/** Executes the catalogue: every worked example of every operator, against the real engine and javac. */
class CatalogueTest {

    private static final Path FOLDER = Path.of("operators");

    /** One example of one operator, with the points the engine makes of it. */
    private record Run(Catalogue.Entry entry, Catalogue.Example example, List<Point> points) {

        String name() {
            return entry.id() + " / " + example.title();
        }
    }

    private static List<Run> runs;

    private static synchronized List<Run> runs() {
        if (runs == null) {
            runs = generate();
        }
        return runs;
    }

    private static List<Run> generate() {
        List<Run> runs = new ArrayList<>();
        for (Catalogue.Entry entry : Catalogue.all()) {
            MutationOperator operator = Operators.byId(entry.id()).orElseThrow();
            for (Catalogue.Example example : entry.examples()) {
                runs.add(new Run(entry, example, Mutate.points(example.source(), operator)));
            }
        }
        return runs;
    }

    private static String normalised(Catalogue.ExpectedMutant expected) {
        return Mutate.line(expected.original(), expected.mutated());
    }

    private static List<String> sorted(Stream<String> lines) {
        return lines.sorted().toList();
    }

    @Nested
    class Examples {

        @TestFactory
        Stream<DynamicTest> produceExactlyTheListedMutants() {
            return runs().stream().map(run -> DynamicTest.dynamicTest(run.name(), () -> {
                List<String> expected = sorted(run.example().mutants().stream().map(CatalogueTest::normalised));
                List<String> actual = sorted(run.points().stream().map(point -> Mutate.line(point, run.example().source())));
                assertEquals(String.join("\n", expected), String.join("\n", actual),
                        "operators/" + run.entry().id() + ".md, example on line " + run.example().line());
            }));
        }

        @TestFactory
        Stream<DynamicTest> giveTheSameMutantsWhenRunAgain() {
            return runs().stream().map(run -> DynamicTest.dynamicTest(run.name(), () -> {
                MutationOperator operator = Operators.byId(run.entry().id()).orElseThrow();
                List<Point> again = Mutate.points(run.example().source(), operator);
                assertEquals(run.points(), again);
            }));
        }

        @Test
        void listedMutantsCompile_andTheOriginalsToo() {
            List<InMemoryJavac.Unit> units = new ArrayList<>();
            for (Run run : runs()) {
                String source = run.example().source();
                String type = publicTypeOf(source);
                units.add(new InMemoryJavac.Unit(run.name() + " (original)", type, source));
                for (Point point : run.points()) {
                    if (markedCompiling(run, point)) {
                        units.add(new InMemoryJavac.Unit(run.name() + ": " + Mutate.line(point, source), type,
                                Mutate.applied(point, source)));
                    }
                }
            }
            Map<String, List<String>> errors = InMemoryJavac.errors(units);
            assertTrue(errors.isEmpty(), () -> "these do not compile:\n" + errors.entrySet().stream()
                    .map(e -> e.getKey() + "\n    " + String.join("\n    ", e.getValue()))
                    .collect(Collectors.joining("\n")));
        }

        @Test
        void mutantsMarkedNotCompiling_doNotCompile() {
            List<InMemoryJavac.Unit> marked = new ArrayList<>();
            for (Run run : runs()) {
                String source = run.example().source();
                for (Point point : run.points()) {
                    if (!markedCompiling(run, point)) {
                        marked.add(new InMemoryJavac.Unit(run.name() + ": " + Mutate.line(point, source),
                                publicTypeOf(source), Mutate.applied(point, source)));
                    }
                }
            }
            assertFalse(marked.isEmpty(), "the catalogue shows at least one mutant that does not compile");
            // One batch: a unit reported with errors surely fails alone; one whose errors another hid fails this test.
            Map<String, List<String>> errors = InMemoryJavac.errors(marked);
            for (InMemoryJavac.Unit unit : marked) {
                assertTrue(errors.containsKey(unit.key()), unit.key() + " compiles after all");
            }
        }

        private static boolean markedCompiling(Run run, Point point) {
            String line = Mutate.line(point, run.example().source());
            return run.example().mutants().stream()
                    .filter(expected -> normalised(expected).equals(line))
                    .allMatch(Catalogue.ExpectedMutant::compiles);
        }

        private static String publicTypeOf(String source) {
            return JavaSources.parse(SourceFile.of(Mutate.PATH, source)).unit().getTypes().stream()
                    .filter(TypeDeclaration::isPublic)
                    .map(TypeDeclaration::getNameAsString)
                    .findFirst().orElse("Example");
        }
    }

    @Nested
    class Files_ {

        @Test
        void everyOperatorHasAFile_andEveryFileAnOperator() throws IOException {
            TreeSet<String> files;
            try (Stream<Path> listing = Files.list(FOLDER)) {
                files = listing.map(path -> path.getFileName().toString()).collect(Collectors.toCollection(TreeSet::new));
            }
            TreeSet<String> operators = Operators.all().stream().map(operator -> operator.id() + ".md")
                    .collect(Collectors.toCollection(TreeSet::new));
            assertEquals(operators, files);
        }

        @Test
        void packagedEntries_areTheFilesOnDisk() throws IOException {
            for (Catalogue.Entry entry : Catalogue.all()) {
                assertEquals(Files.readString(FOLDER.resolve(entry.id() + ".md")), entry.text(), entry.id());
            }
        }

        @Test
        void everyEntrySaysItsSetAsTheRegistryDoes_andHasTheRequiredParts() {
            for (Catalogue.Entry entry : Catalogue.all()) {
                assertEquals(Operators.isDefault(entry.id()), entry.isDefault(), entry.id() + ": Set");
                assertTrue(entry.facts().containsKey("Models"), entry.id() + ": Models");
                assertTrue(entry.facts().containsKey("Reference"), entry.id() + ": Reference");
                assertTrue(entry.text().contains("\n## What it skips\n"), entry.id() + ": What it skips");
                assertFalse(entry.examples().isEmpty(), entry.id() + ": examples");
                assertTrue(entry.examples().stream().anyMatch(example -> example.mutants().isEmpty()),
                        entry.id() + ": an example that must produce nothing");
            }
        }

        @Test
        void operatorIdsAreKebabCase_andUnique() {
            List<String> ids = Operators.all().stream().map(MutationOperator::id).toList();
            assertEquals(ids.size(), new TreeSet<>(ids).size());
            ids.forEach(id -> assertTrue(id.matches("[a-z]+(-[a-z]+)+"), id));
        }
    }

    @Nested
    class Parsing {

        private static final String MINIMAL = """
                # some-swap

                Swaps something.

                - **Set:** on request
                - **Models:** a slip.
                - **Reference:** none

                ## What it skips
                - **Not:** a fact, only prose.

                ## Examples

                ### Two mutants
                ```java
                class A { int f(int a, int b) { return a + b; } }
                ```
                ```mutants
                a + b => a - b
                f(); => (statement removed)
                a / b => a % b [does not compile]
                ```

                ### Nothing here
                ```java
                class B {}
                ```
                """;

        @Test
        void readsTheSummaryFactsAndExamples() {
            Catalogue.Entry entry = Catalogue.parse("some-swap", MINIMAL);
            assertEquals("Swaps something.", entry.summary());
            assertEquals(Map.of("Set", "on request", "Models", "a slip.", "Reference", "none"), entry.facts());
            assertFalse(entry.isDefault());
            assertEquals(List.of("Two mutants", "Nothing here"), entry.examples().stream().map(Catalogue.Example::title).toList());
            assertEquals("class A { int f(int a, int b) { return a + b; } }\n", entry.examples().get(0).source());
            assertEquals(List.of(
                    new Catalogue.ExpectedMutant("a + b", "a - b", true),
                    new Catalogue.ExpectedMutant("f();", "", true),
                    new Catalogue.ExpectedMutant("a / b", "a % b", false)), entry.examples().get(0).mutants());
            assertEquals(List.of(), entry.examples().get(1).mutants());
        }

        @Test
        void aWrongHeading_failsWithTheLine() {
            IllegalArgumentException thrown = assertThrows(IllegalArgumentException.class,
                    () -> Catalogue.parse("other-swap", MINIMAL));
            assertEquals("operators/other-swap.md:1: the file must start with '# other-swap'", thrown.getMessage());
        }

        @Test
        void anUnknownSet_fails() {
            IllegalArgumentException thrown = assertThrows(IllegalArgumentException.class,
                    () -> Catalogue.parse("some-swap", MINIMAL.replace("on request", "sometimes")));
            assertTrue(thrown.getMessage().endsWith("'- **Set:**' must say 'default' or 'on request'"), thrown.getMessage());
        }

        @Test
        void aMutantLineWithoutArrow_failsWithItsText() {
            IllegalArgumentException thrown = assertThrows(IllegalArgumentException.class,
                    () -> Catalogue.parse("some-swap", MINIMAL.replace("a + b => a - b", "a + b -> a - b")));
            assertTrue(thrown.getMessage().contains("'a + b -> a - b'"), thrown.getMessage());
        }

        @Test
        void anUnclosedBlock_fails() {
            String broken = MINIMAL.substring(0, MINIMAL.lastIndexOf("```"));
            IllegalArgumentException thrown = assertThrows(IllegalArgumentException.class,
                    () -> Catalogue.parse("some-swap", broken));
            assertTrue(thrown.getMessage().contains("is never closed"), thrown.getMessage());
        }
    }
}
