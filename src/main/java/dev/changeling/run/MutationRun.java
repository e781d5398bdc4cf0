package dev.changeling.run;

import dev.changeling.ExitCode;
import dev.changeling.UserError;
import dev.changeling.compile.BuildRequest;
import dev.changeling.compile.BuildResult;
import dev.changeling.compile.MutantBuild;
import dev.changeling.compile.SchemaStage;
import dev.changeling.execution.Baseline;
import dev.changeling.execution.JobResult;
import dev.changeling.execution.SuiteSetup;
import dev.changeling.execution.WorkerClasses;
import dev.changeling.execution.WorkerPool;
import dev.changeling.execution.WorkerSettings;
import dev.changeling.mutant.Mutant;
import dev.changeling.mutant.Selection;
import dev.changeling.mutant.Shard;
import dev.changeling.project.CodeModule;
import dev.changeling.project.DiscoveredModule;
import dev.changeling.project.DiscoveredProject;
import dev.changeling.project.ProjectDiscovery;
import dev.changeling.project.ProjectLayout;
import dev.changeling.recall.SchemaCode;
import dev.changeling.results.CompiledAlike;
import dev.changeling.results.ModuleRecord;
import dev.changeling.results.MutantResult;
import dev.changeling.results.RunResults;
import dev.changeling.results.ShardRecord;
import dev.changeling.results.TestRecord;
import dev.changeling.results.Verdict;
import dev.changeling.scope.ChangeScope;
import dev.changeling.source.SourceFile;
import dev.changeling.source.SourceHash;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;

/**
 * One mutation run end to end: discover the project, make the mutants, compile them as a schema, run
 * the unmutated suite once, run each mutant's reaching tests, and write the results file.
 */
public final class MutationRun {

    private final RunRequest request;
    private final RunListener listener;
    private volatile WorkerPool pool;
    private volatile boolean stopped;
    private volatile boolean mutantsStarted;
    /** The thread building the project, while it does: a stop interrupts it, which ends a running mvn. */
    private Thread building;

    public MutationRun(RunRequest request, RunListener listener) {
        this.request = request;
        this.listener = listener;
    }

    /**
     * Runs everything. After {@link #stop()} it returns what finished (complete only if every mutant has its
     * verdict), or, when it was stopped before it could record anything, throws a {@link UserError} with the code
     * {@link ExitCode#INTERRUPTED} that says so: whatever failed after a stop failed because of it.
     */
    public RunResults execute() {
        try {
            return run();
        } catch (RuntimeException failure) {
            if (!stopped || failure instanceof UserError user && user.exitCode() == ExitCode.INTERRUPTED) {
                throw failure;
            }
            throw new UserError((mutantsStarted ? "stopped" : "stopped before any mutant ran") + "; nothing was written",
                    ExitCode.INTERRUPTED);
        }
    }

    /**
     * Stops the run from another thread (Ctrl-C): a running mvn is ended, workers are ended (asked to exit, killed
     * if they will not) and the finished verdicts kept.
     */
    public void stop() {
        synchronized (this) {
            stopped = true;
            if (building != null) {
                building.interrupt();
            }
        }
        WorkerPool running = pool;
        if (running != null) {
            running.stop();
        }
    }

    /** Counts the files that hold mutants: the parsed files also include those only compiled alongside. */
    static String inFiles(List<String> mutantFiles) {
        long files = mutantFiles.stream().distinct().count();
        return "in " + files + (files == 1 ? " file" : " files");
    }

    /**
     * The phases in order: discover, generate and narrow, then for each module (a project of one module is its only
     * one): compile the schema, baseline, compile the mutants that cannot join the schema (only once the suite is known
     * to be green), execute, compare survivors; record.
     */
    private RunResults run() {
        PhaseClock clock = new PhaseClock(listener::starting);
        List<DiscoveredModule> modules = clock.time(PhaseClock.MAVEN, this::discover);
        boolean several = !modules.get(0).path().isEmpty();
        listener.phase("maven: " + modules.get(0).project().build() + (several ? "" : " (" + modules.get(0).project().junitSetup() + ")"));
        if (several) {
            announce(modules);
        }
        checkNotStopped();

        ProjectLayout layout = several
                ? request.layout().withModules(modules.stream().map(module -> module.project().layout()).toList())
                : modules.get(0).project().layout();
        Optional<ChangeScope> change = request.change().map(spec -> spec.resolve(layout.root()));
        Selection.Chosen whole = clock.time(PhaseClock.GENERATE, () -> generate(layout, change));
        Selection.Chosen chosen = request.shard().map(shard -> inShard(whole, shard)).orElse(whole);
        checkNotStopped();

        Map<String, MutantResult> results = new ConcurrentHashMap<>();
        List<TestRecord> tests = new ArrayList<>();
        List<ModuleRecord> records = new ArrayList<>();
        boolean complete = true;
        CompiledAlike alike = CompiledAlike.NONE;
        for (DiscoveredModule module : modules) {
            if (stopped) {
                complete = false;
                break;
            }
            ModuleRecord record = new ModuleRecord(module.path(), module.testedAlsoBy());
            List<Mutant> own = chosen.mutants().stream().filter(mutant -> record.holds(mutant.file())).toList();
            if (several) {
                records.add(record);
                listener.phase("module " + module.path() + ": " + own.size() + (own.size() == 1 ? " mutant" : " mutants")
                        + " (" + module.project().junitSetup() + ")" + testedAlsoByNote(module));
                if (own.isEmpty()) {
                    continue;
                }
            }
            ModuleOutcome outcome;
            try {
                outcome = runModule(module, own, chosen, clock, results);
            } catch (RuntimeException failure) {
                if (!stopped || !mutantsStarted) {
                    throw failure;
                }
                complete = false;
                break;
            }
            tests.addAll(outcome.tests());
            alike = alike.plus(outcome.alike());
            if (!outcome.complete()) {
                complete = false;
                break;
            }
        }
        return record(whole, chosen, change, results, tests, complete, clock, alike, records);
    }

    /** What one module's part of the run found. */
    private record ModuleOutcome(List<TestRecord> tests, boolean complete, CompiledAlike alike) {
    }

    /**
     * One module's mutants against its own tests: compile the schema, baseline, compile alone, execute, compare
     * survivors; verdicts go into {@code results} as they come.
     */
    private ModuleOutcome runModule(DiscoveredModule module, List<Mutant> mutants, Selection.Chosen chosen, PhaseClock clock,
                                    Map<String, MutantResult> results) {
        DiscoveredProject project = module.project();
        Path work = project.layout().changelingDirectory();
        List<Path> compileClasspath = compileClasspath(project, work);
        SchemaStage schema = clock.time(PhaseClock.COMPILE, () -> compileSchema(mutants, chosen, compileClasspath, work));
        checkNotStopped();

        Map<String, SourceFile> files = chosen.generated().files();
        Map<String, MutantResult> own = new ConcurrentHashMap<>();
        List<TestRecord> tests;
        boolean complete;
        EarlierRuns earlier = EarlierRuns.open(request, listener, project, work, chosen);
        SchemaCode code = new SchemaCode(schema.points(), schema.entries(), files);
        SuiteSetup setup = TestJvm.setup(project.suite(), request, schema.pointCount(), project.productionClasses(), listener)
                .withMethodCount(schema.methodCount());
        try (WorkerPool workers = WorkerPool.open(workerSettings(project, schema.schemaClasses(), work), setup)) {
            pool = workers;
            checkNotStopped();
            Baseline baseline = clock.time(PhaseClock.BASELINE, () -> earlier.baseline(workers, code, setup));
            GreenBaseline.require(baseline, setup, project.layout().root().resolve(module.path()));
            tests = baseline.tests().stream().map(test -> new TestRecord(test.id(), test.name(), test.nanos() / 1e6)).toList();
            listener.phase(String.format(Locale.ROOT, "baseline: %d tests green in %.1f s%s",
                    baseline.tests().size(), baseline.nanos() / 1e9, GreenBaseline.freshWorkers(baseline)));
            earlier.map(code, baseline);
            if (request.reuse().mapOnly()) {
                return new ModuleOutcome(tests, true, CompiledAlike.NONE);
            }

            BuildResult build = clock.time(PhaseClock.COMPILE_ALONE, schema::compileAlone);
            Placements placements = Placements.of(mutants, build, files);
            int rounds = build.timings().schemaRounds();
            listener.phase("compiled: " + build.pointCount() + " points in one schema "
                    + (rounds == 0 ? "(the last run's: the same points, sources and classpath)"
                            : "in " + build.timings().compileMillis() + " ms (" + rounds + (rounds == 1 ? " round" : " rounds") + ")")
                    + "; " + build.timings().aloneCompiles() + " mutants compiled alone; "
                    + placements.count(Verdict.STILLBORN) + " stillborn, " + placements.count(Verdict.SKIPPED) + " skipped (run once per JVM)");
            own.putAll(placements.settled());
            checkNotStopped();

            JobPlan plan = earlier.recalling(JobPlan.of(placements.runnable(), build, baseline, request.deadlines(), files,
                    request.everyTest()), baseline, code, files);
            own.putAll(plan.settled());
            results.putAll(own);
            own.values().forEach(listener::finished);
            listener.running(plan.jobs().size());
            mutantsStarted = true;
            List<JobResult> finished = clock.time(PhaseClock.EXECUTE, () -> workers.run(plan.jobs(), job -> {
                MutantResult result = plan.resultOf(job, files);
                plan.keep(job, result, earlier.recall(), earlier.keys(), files);
                own.put(job.key(), result);
                results.put(job.key(), result);
                listener.finished(result);
            }));
            complete = finished.size() == plan.jobs().size();
            listener.phase(workers.workersStarted() + " workers started; " + workers.workerTime().describe());
            if (complete && !stopped && request.recheckTimeouts()) {
                TimeoutRecheck.run(workers, plan.jobs(), finished, request.deadlines(), plan::label, listener);
            }
        }
        CompiledAlike alike = stopped ? CompiledAlike.NONE
                : clock.time(PhaseClock.COMPARE, () -> SurvivorComparison.compare(mutants, files, own, compileClasspath,
                        request.shard().isPresent(), earlier.recall(), earlier.keys()));
        if (alike.compared() > 0) {
            listener.phase(SurvivorComparison.describe(alike));
        }
        earlier.save();
        return new ModuleOutcome(tests, complete, alike);
    }

    /** The shard's part of the chosen mutants, said in a line. */
    private Selection.Chosen inShard(Selection.Chosen whole, Shard shard) {
        Selection.Chosen part = whole.inShard(shard);
        listener.phase("shard " + shard + ": " + part.mutants().size() + " of the " + whole.mutants().size()
                + " mutants; merge the results files of all " + shard.count() + " shards with 'changeling merge'");
        return part;
    }

    /** The modules in the reactor's order, and those left out for want of tests of their own; or the one picked. */
    private void announce(List<DiscoveredModule> modules) {
        if (request.module().isPresent()) {
            listener.phase("modules: " + request.module().get() + " alone (--module), against its own tests");
            return;
        }
        listener.phase("modules: " + String.join(", ", modules.stream().map(DiscoveredModule::path).toList())
                + " (in the reactor's order); each module's mutants run against its own tests");
        List<CodeModule> untested = CodeModule.below(request.layout().root()).stream().filter(module -> !module.hasTests()).toList();
        if (!untested.isEmpty()) {
            listener.phase("modules: left out, having no tests of their own: " + CodeModule.paths(untested));
        }
    }

    private static String testedAlsoByNote(DiscoveredModule module) {
        return module.testedAlsoBy().isEmpty() ? ""
                : "; its classes are also on the test classpath of " + String.join(", ", module.testedAlsoBy())
                        + ", whose tests do not run against its mutants";
    }

    /**
     * Builds the project where a stop can interrupt it: mvn is ended then, and whatever the build says after that
     * (mvn's own exit on the same Ctrl-C, say) is reported as the interruption it is.
     */
    private List<DiscoveredModule> discover() {
        synchronized (this) {
            checkNotStopped();
            building = Thread.currentThread();
        }
        try {
            return ProjectDiscovery.discoverModules(request.layout(), request.discovery(), request.module());
        } catch (RuntimeException failure) {
            if (stopped) {
                throw new UserError("interrupted while the project was being built; nothing was written", ExitCode.INTERRUPTED);
            }
            throw failure;
        } finally {
            synchronized (this) {
                building = null;
                Thread.interrupted();
            }
        }
    }

    private Selection.Chosen generate(ProjectLayout layout, Optional<ChangeScope> change) {
        Selection selection = change.map(scope -> request.selection().narrowedTo(scope.filter())).orElse(request.selection());
        Selection.Chosen chosen = selection.choose(layout, request.limits(), change.map(ChangeScope::files));
        listener.phase("mutants: " + chosen.mutants().size()
                + (chosen.sampled() ? " sampled from " + chosen.population() : "")
                + " " + inFiles(chosen.mutants().stream().map(Mutant::file).toList())
                + change.map(scope -> " (" + scope.description() + ")").orElse(""));
        selection.budgetNote(chosen).ifPresent(listener::phase);
        selection.mixNote(chosen).ifPresent(listener::phase);
        chosen.generated().problems().forEach(problem -> listener.phase("skipped " + problem));
        return chosen;
    }

    /** The project's compile classpath and the probe: what every mutant compiles against. */
    private static List<Path> compileClasspath(DiscoveredProject project, Path work) {
        List<Path> compileClasspath = new ArrayList<>(project.compileClasspath());
        compileClasspath.add(WorkerClasses.extract(work.resolve("worker-classes")));
        return compileClasspath;
    }

    private static SchemaStage compileSchema(List<Mutant> mutants, Selection.Chosen chosen, List<Path> compileClasspath, Path work) {
        return MutantBuild.compileSchema(new BuildRequest(mutants, chosen.generated().files(), compileClasspath,
                work.resolve("build"), chosen.generated().entryMethods()));
    }

    private WorkerSettings workerSettings(DiscoveredProject project, Path schemaClasses, Path work) {
        List<Path> classpath = new ArrayList<>();
        classpath.add(schemaClasses);
        classpath.addAll(project.testClasspath());
        return TestJvm.settings(project.suite(), request, classpath, work.resolve("workers"), project.layout());
    }

    /**
     * The results of the mutants {@code chosen} for this run. A shard's results also keep the whole selection, and
     * hash the files of every mutant in it, so that every shard of a run holds the same hashes and a merge can tell.
     */
    private RunResults record(Selection.Chosen whole, Selection.Chosen chosen, Optional<ChangeScope> change,
                              Map<String, MutantResult> results, List<TestRecord> tests, boolean complete, PhaseClock clock,
                              CompiledAlike alike, List<ModuleRecord> modules) {
        List<MutantResult> ordered = chosen.mutants().stream()
                .map(mutant -> results.get(mutant.fingerprint()))
                .filter(Objects::nonNull)
                .distinct()
                .toList();
        ShardRecord shard = request.shard()
                .map(share -> new ShardRecord(share.index(), share.count(), whole.mutants().stream().map(Mutant::fingerprint).toList()))
                .orElse(null);
        List<String> hashed = (shard == null ? ordered.stream().map(MutantResult::file) : whole.mutants().stream().map(Mutant::file))
                .toList();
        return new RunResults(RunResults.FORMAT, complete, request.settings(chosen, change.map(ChangeScope::description)),
                tests, clock.withTotal(), ordered, chosen.generated().problems().stream().map(Object::toString).toList(),
                hashes(chosen.generated().files(), hashed), chosen.generated().notMade(), alike, shard, modules);
    }

    private static Map<String, String> hashes(Map<String, SourceFile> files, List<String> paths) {
        Map<String, String> hashes = new java.util.TreeMap<>();
        paths.stream().distinct().forEach(path -> hashes.put(path, SourceHash.sha256(files.get(path).text())));
        return hashes;
    }

    private void checkNotStopped() {
        if (stopped) {
            throw new UserError("stopped before any mutant ran; nothing was written", ExitCode.INTERRUPTED);
        }
    }
}
