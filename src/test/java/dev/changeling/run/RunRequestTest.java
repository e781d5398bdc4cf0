package dev.changeling.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.execution.Deadlines;
import dev.changeling.mutant.HigherOrder;
import dev.changeling.mutant.LineBudget;
import dev.changeling.mutant.MutantRequest;
import dev.changeling.mutant.Selection;
import dev.changeling.operator.Operators;
import dev.changeling.project.DiscoveryOptions;
import dev.changeling.project.ExplicitProject;
import dev.changeling.project.ProjectLayout;
import dev.changeling.results.ResultsFile;
import dev.changeling.results.RunResults;
import dev.changeling.results.RunSettings;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The request a run records is the request a re-run of one of its mutants makes again. */
class RunRequestTest {

    // The settings go through the results file as it is written and read, so what is lost there shows here.

    @TempDir
    Path folder;

    @Test
    void aProjectGivenByHandIsRunAgainTheWayItWasRun() throws IOException {
        Path sources = Files.createDirectories(folder.resolve("lib/src"));
        ExplicitProject given = new ExplicitProject(List.of(sources), List.of(), folder.resolve("lib/classes"),
                folder.resolve("lib/test-classes"), List.of(folder.resolve("lib/junit.jar")));
        DiscoveryOptions discovery = DiscoveryOptions.defaults().withMavenArguments(List.of("-o"))
                .withMavenExecutable(folder.resolve("bin/mvn")).withExplicitProject(given);
        Selection selection = new Selection(new MutantRequest(Operators.named(List.of("relational-subset")), List.of(1),
                HigherOrder.Scope.METHOD, 7, point -> true).withBudget(new LineBudget(2, Map.of("relational-subset", 0.5))),
                null, null, 7, null);
        RunRequest first = new RunRequest(ProjectLayout.locate(folder, Optional.of(given)), List.of(), selection,
                Optional.empty(), discovery, 2, new Deadlines(2.5, 400), Optional.of("768m"), 40, List.of("*IT"),
                List.of("slow"), false, true, Optional.empty(), Optional.empty(), Reuse.DEFAULT);

        RunSettings settings = first.settings(new Selection.Chosen(List.of(), 0, false, null), Optional.empty());
        Path file = folder.resolve("results.json");
        ResultsFile.write(file, new RunResults(RunResults.FORMAT, true, settings, List.of(), Map.of(), List.of(), List.of(), Map.of()));
        RunSettings recorded = ResultsFile.read(file).settings();
        RunRequest again = RunRequest.again(folder, recorded, Optional.empty(), 1, point -> true);

        assertEquals(first.layout(), again.layout());
        assertEquals(first.discovery(), again.discovery());
        assertEquals(first.deadlines(), again.deadlines());
        assertEquals(first.workerHeap(), again.workerHeap());
        assertEquals(first.mutantsPerWorker(), again.mutantsPerWorker());
        assertEquals(first.skipTests(), again.skipTests());
        assertEquals(first.skipTags(), again.skipTags());
        assertEquals(List.of("relational-subset"), again.selection().request().operators().stream().map(o -> o.id()).toList());
        assertEquals(1, again.workers(), "one mutant needs one worker");
        assertEquals(2, again.selection().request().budget().perLine(), "the per-line budget the run was made with");
        assertTrue(again.everyTest(), "a run that built the full kill matrix runs the mutant again the same way");
    }
}
