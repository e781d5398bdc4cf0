package dev.changeling.run;

import dev.changeling.execution.Baseline;
import dev.changeling.execution.SuiteSetup;
import dev.changeling.execution.WorkerPool;
import dev.changeling.mutant.Selection;
import dev.changeling.project.DiscoveredProject;
import dev.changeling.project.SuiteConfiguration;
import dev.changeling.recall.ProjectClasses;
import dev.changeling.recall.ReachMap;
import dev.changeling.recall.Recall;
import dev.changeling.recall.SchemaCode;
import dev.changeling.recall.VerdictKeys;
import dev.changeling.results.RunSettings;
import dev.changeling.source.SourceFile;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * What one module's part of a run takes from earlier runs and leaves for later ones: the reach map, which spares the
 * baseline the test classes whose reach cannot have changed, and the kept verdicts and comparisons, which spare the
 * mutants whose inputs are those of an earlier run.
 */
final class EarlierRuns {

    private final RunRequest request;
    private final RunListener listener;
    private final Path work;
    private final ProjectClasses classes;
    private final Recall recall;
    private final String generation;
    private final boolean wholeProject;
    private VerdictKeys keys;

    private EarlierRuns(RunRequest request, RunListener listener, Path work, ProjectClasses classes, Recall recall,
                        String generation, boolean wholeProject) {
        this.request = request;
        this.listener = listener;
        this.work = work;
        this.classes = classes;
        this.recall = recall;
        this.generation = generation;
        this.wholeProject = wholeProject;
    }

    /** Reads the module's compiled classes and what earlier runs left in its build folder ({@code work}). */
    static EarlierRuns open(RunRequest request, RunListener listener, DiscoveredProject project, Path work, Selection.Chosen chosen) {
        Recall kept = Recall.open(work.resolve(Recall.FILE_NAME), listener::phase);
        ProjectClasses classes = ProjectClasses.read(project.classesDirectory(), project.testClassRoots(), project.testClasspath(),
                testJvm(request, project.suite()));
        RunSettings settings = request.settings(chosen, Optional.empty());
        boolean wholeProject = request.change().isEmpty() && request.limits().isEmpty() && request.shard().isEmpty()
                && !chosen.sampled() && settings.orders().contains(1) && settings.mix() == null;
        return new EarlierRuns(request, listener, work, classes, request.reuse().recall() ? kept : kept.withoutGiving(),
                "operators " + settings.operators() + "; diagnostics mutated " + settings.mutateDiagnostics(), wholeProject);
    }

    /**
     * The unmutated suite: the test classes the reach map cannot vouch for run, the others' tests come from the map; a
     * run of every point then writes the map for later runs.
     */
    Baseline baseline(WorkerPool workers, SchemaCode schema, SuiteSetup setup) {
        Path map = request.reuse().reachMap().orElse(work.resolve(ReachMap.FILE_NAME));
        ReachMap.Choice choice = request.reuse().selectsTests()
                ? ReachMap.choose(map, classes, generation, schema, setup.testClasses())
                : new ReachMap.Choice(null, List.of(), "");
        if (choice.runs() != null || Files.isRegularFile(map) && request.reuse().selectsTests()) {
            listener.phase(choice.summary());
        }
        Baseline baseline = workers.baseline(choice::runs, name -> { }).with(choice.mapped());
        if (choice.runs() == null) {
            TestJvm.noteUnusedSkipTags(request, baseline, listener);
        }
        return baseline;
    }

    /** Writes the reach map after a green baseline of every point; says so when the run does nothing else. */
    void map(SchemaCode schema, Baseline baseline) {
        if (!wholeProject) {
            return;
        }
        Path file = work.resolve(ReachMap.FILE_NAME);
        try {
            ReachMap.write(file, classes, generation, schema, baseline);
            if (request.reuse().mapOnly()) {
                listener.phase("reach map: " + baseline.tests().size() + " tests over " + schema.points().size() + " points written to "
                        + file + "; hand it to later runs with --reach-map FILE, or leave it where it is");
            }
        } catch (IOException | RuntimeException e) {
            listener.phase(ReachMap.unwritten(file, e));
        }
    }

    /** The plan less the mutants whose verdicts are kept under today's inputs, said in a line. */
    JobPlan recalling(JobPlan planned, Baseline baseline, SchemaCode schema, Map<String, SourceFile> files) {
        keys = VerdictKeys.of(classes, request.deadlines() + "; " + request.mutantsPerWorker() + " mutants per worker; every test "
                + request.everyTest(), baseline, schema);
        JobPlan plan = planned.recalling(recall, keys, files);
        int recalled = plan.settled().size() - planned.settled().size();
        if (recalled > 0) {
            listener.phase("recalled: " + recalled + (recalled == 1 ? " verdict" : " verdicts") + " of earlier runs whose mutant,"
                    + " tests, classes and settings are the same (" + Recall.FILE_NAME + "; --run-all runs them)");
        }
        return plan;
    }

    Recall recall() {
        return recall;
    }

    /** The keys of this run's verdicts; known once {@link #recalling} has run. */
    VerdictKeys keys() {
        return keys;
    }

    /** Writes what is kept for later runs, leaving out files that are gone. */
    void save() {
        recall.save(path -> Files.exists(request.layout().root().resolve(path)), listener::phase);
    }

    /** How the tests run, whichever tests they are: a new test class must not change what every test is compared by. */
    private static String testJvm(RunRequest request, SuiteConfiguration suite) {
        return "tags " + suite.includedTags() + " " + suite.excludedTags() + "; properties " + suite.systemProperties()
                + "; environment " + suite.environment() + "; parameters " + suite.configurationParameters() + "; options "
                + suite.jvmArguments() + " " + suite.maxHeap() + "; in " + suite.workingDirectory() + "; fresh JVM per class "
                + suite.freshJvmPerClass() + "; heap " + request.workerHeap().orElse("default") + "; skipped " + request.skipTests()
                + " " + request.skipTags() + "; maven " + request.discovery();
    }
}
