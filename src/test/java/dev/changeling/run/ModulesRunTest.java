package dev.changeling.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.ExitCode;
import dev.changeling.cli.Main;
import dev.changeling.results.ModuleRecord;
import dev.changeling.results.MutantResult;
import dev.changeling.results.TestRecord;
import dev.changeling.results.Verdict;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

/**
 * The orchard sample run from the root of its two-module build: each module's mutants against its own tests, one
 * results file and one report for both, the module whose classes the other's tests also have on their classpath named,
 * and {@code --module} picking one.
 */
@Tag("e2e")
class ModulesRunTest {

    private static final String CRATES = "crates/src/main/java/dev/changeling/samples/orchard/crates/";
    private static final String STALL = "stall/src/main/java/dev/changeling/samples/orchard/stall/";

    @Nested
    @TestInstance(TestInstance.Lifecycle.PER_CLASS)
    class EveryModule {

        ToolRun run;

        @BeforeAll
        void runTheSampleFromItsRoot(@TempDir Path temporary) {
            run = ToolRun.onCopyOf("orchard", temporary.resolve("orchard"));
            assertNotNull(run.results(), run::transcript);
        }

        @Test
        void oneResultsFile_holdsTheMutantsOfBothModules_withPathsFromTheRoot() {
            assertEquals(ExitCode.OK, run.exitCode(), run::transcript);
            assertTrue(run.results().mutants().stream().anyMatch(mutant -> mutant.file().startsWith(CRATES)), run::transcript);
            assertTrue(run.results().mutants().stream().anyMatch(mutant -> mutant.file().startsWith(STALL)), run::transcript);
            assertTrue(run.results().mutants().stream().allMatch(mutant -> mutant.file().startsWith(CRATES)
                    || mutant.file().startsWith(STALL)), run::transcript);
            assertTrue(run.results().sourceHashes().keySet().stream().allMatch(file -> file.startsWith("crates/")
                    || file.startsWith("stall/")), () -> run.results().sourceHashes().toString());
        }

        @Test
        void theModulesAreRecordedInTheReactorsOrder_notThePomsListing() {
            // the root pom lists stall first; stall depends on crates, so Maven builds crates first
            assertEquals(List.of(new ModuleRecord("crates", List.of("stall")), new ModuleRecord("stall", List.of())),
                    run.results().modules());
        }

        @Test
        void eachModulesMutants_ranAgainstItsOwnTestsOnly() {
            for (MutantResult mutant : run.results().mutants()) {
                String own = mutant.file().startsWith(CRATES) ? "orchard.crates." : "orchard.stall.";
                assertTrue(mutant.testsRun().stream().allMatch(test -> test.contains(own)), mutant::toString);
                assertTrue(mutant.reachedBy().stream().allMatch(test -> test.contains(own)), mutant::toString);
            }
            assertTrue(run.withVerdict(Verdict.KILLED).stream().anyMatch(mutant -> mutant.killedBy().contains("orchard.crates.CrateTest")));
            assertTrue(run.withVerdict(Verdict.KILLED).stream().anyMatch(mutant -> mutant.killedBy().contains("orchard.stall.PriceBoardTest")));
            List<String> testClasses = run.results().tests().stream().map(TestRecord::id)
                    .map(id -> id.replaceAll(".*\\[class:([^\\]]+)\\].*", "$1")).distinct().sorted().toList();
            assertEquals(List.of("dev.changeling.samples.orchard.crates.CrateTest", "dev.changeling.samples.orchard.crates.RipenessTest",
                    "dev.changeling.samples.orchard.stall.PriceBoardTest"), testClasses);
        }

        @Test
        void aMethodOnlyTheOtherModulesTestsCall_isUnreachedInItsOwnModule() throws IOException {
            int line = lineOf(run.project().resolve(CRATES + "Crate.java"), "return apples == CAPACITY;");
            List<MutantResult> full = run.results().mutants().stream()
                    .filter(mutant -> mutant.file().equals(CRATES + "Crate.java") && mutant.first().line() == line)
                    .toList();

            assertFalse(full.isEmpty(), run::transcript);
            assertTrue(full.stream().allMatch(mutant -> mutant.verdict() == Verdict.UNREACHED), full::toString);
        }

        @Test
        void theReport_givesEachModulesScore_andSaysWhoseTestsAlsoReachCrates() {
            assertTrue(run.out().contains("by module (each module's mutants against its own tests):"), run::transcript);
            assertTrue(run.out().lines().anyMatch(line -> line.startsWith("  module crates: score ")
                    && line.endsWith("its classes are also on the test classpath of stall, whose tests did not run against its mutants")),
                    run::transcript);
            assertTrue(run.out().lines().anyMatch(line -> line.startsWith("  module stall: score 1.00 ")), run::transcript);
            assertTrue(run.err().contains("modules: crates, stall (in the reactor's order)"), run::transcript);
        }

        @Test
        void theMarkdownExport_fromTheRoot_readsTheMergedResults(@TempDir Path out) throws IOException {
            Path markdown = out.resolve("review.md");

            Outcome export = execute("export", "--plain", "--markdown", markdown.toString(), run.project().toString());

            assertEquals(ExitCode.OK, export.exitCode(), export::toString);
            String text = Files.readString(markdown);
            assertTrue(text.contains("- module crates: score "), text);
            assertTrue(text.contains("- module stall: score 1.00 "), text);
            assertTrue(text.contains(CRATES + "Crate.java"), text);
        }

        @Test
        void aMutantRunAgainFromTheRoot_isTheSameMutant_withTheSameVerdict() {
            MutantResult survivor = run.withVerdict(Verdict.SURVIVED).stream()
                    .filter(mutant -> mutant.file().startsWith(CRATES)).findFirst().orElseThrow();

            MutantResult again = new Rerun(run.project(), run.results()).rerun(survivor);

            assertEquals(survivor.id(), again.id());
            assertEquals(Verdict.SURVIVED, again.verdict());
            assertEquals(survivor.reachedBy(), again.reachedBy());
        }
    }

    @Nested
    @TestInstance(TestInstance.Lifecycle.PER_CLASS)
    class OneModule {

        ToolRun run;

        @BeforeAll
        void runOneModuleFromTheRoot(@TempDir Path temporary) {
            run = ToolRun.onCopyOf("orchard", temporary.resolve("orchard"), "--module", "./crates/");
            assertNotNull(run.results(), run::transcript);
        }

        @Test
        void onlyThatModulesMutantsAreMade_andItsResultsGoToTheRoot() {
            assertEquals(ExitCode.OK, run.exitCode(), run::transcript);
            assertFalse(run.results().mutants().isEmpty(), run::transcript);
            assertTrue(run.results().mutants().stream().allMatch(mutant -> mutant.file().startsWith(CRATES)), run::transcript);
            assertEquals(List.of(new ModuleRecord("crates", List.of())), run.results().modules());
            assertFalse(Files.exists(run.project().resolve("stall/target/classes")), "stall is not built for crates alone");
        }
    }

    @Nested
    class CommandLine {

        @TempDir
        Path temporary;

        @Test
        void anUnknownModule_isExitTwo_withOneLineListingTheModules() {
            Path root = SampleProjects.copy("orchard", temporary.resolve("orchard"));

            Outcome run = execute("run", "--plain", "--module", "orchard-crates", root.toString());

            assertEquals(ExitCode.USAGE, run.exitCode(), run::toString);
            assertEquals("changeling: --module: " + root + " has no module 'orchard-crates'; its modules: stall, crates\n",
                    run.err(), run::toString);
            assertFalse(Files.exists(root.resolve("target")), "nothing ran");
        }

        @Test
        void aModuleOfAProjectWithoutModules_isExitTwo() {
            Path root = SampleProjects.copy("harbour", temporary.resolve("harbour"));

            Outcome run = execute("run", "--plain", "--module", "core", root.toString());

            assertEquals(ExitCode.USAGE, run.exitCode(), run::toString);
            assertTrue(run.err().startsWith("changeling: --module picks one module of a multi-module build, and " + root
                    + " is not the root of one"), run::toString);
        }
    }

    /** What one command printed and returned. */
    record Outcome(int exitCode, String out, String err) {
    }

    private static Outcome execute(String... arguments) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int exit = Main.execute(new PrintWriter(out, true), new PrintWriter(err, true), arguments);
        return new Outcome(exit, out.toString(), err.toString());
    }

    private static int lineOf(Path file, String text) throws IOException {
        List<String> lines = Files.readAllLines(file);
        for (int i = 0; i < lines.size(); i++) {
            if (lines.get(i).contains(text)) {
                return i + 1;
            }
        }
        throw new AssertionError(text + " is not in " + file);
    }
}
