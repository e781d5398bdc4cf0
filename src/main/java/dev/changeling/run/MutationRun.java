package dev.changeling.run;

import dev.changeling.ExitCode;
import dev.changeling.UserError;
import dev.changeling.compile.BuildRequest;
import dev.changeling.compile.BuildResult;
import dev.changeling.compile.MutantBuild;
import dev.changeling.compile.Placement;
import dev.changeling.execution.Baseline;
import dev.changeling.execution.RecordedTest;
import dev.changeling.execution.JobResult;
import dev.changeling.execution.MutantJob;
import dev.changeling.execution.SuiteSetup;
import dev.changeling.execution.TestRun;
import dev.changeling.execution.TestStatus;
import dev.changeling.execution.WorkerClasses;
import dev.changeling.execution.WorkerPool;
import dev.changeling.execution.WorkerSettings;
import dev.changeling.mutant.Mutant;
import dev.changeling.mutant.Point;
import dev.changeling.mutant.Selection;
import dev.changeling.project.DiscoveredProject;
import dev.changeling.project.ProjectDiscovery;
import dev.changeling.project.ProjectLayout;
import dev.changeling.project.SuiteConfiguration;
import dev.changeling.results.MutantResult;
import dev.changeling.results.Records;
import dev.changeling.results.RunResults;
import dev.changeling.results.RunSettings;
import dev.changeling.results.TestRecord;
import dev.changeling.results.Verdict;
import dev.changeling.source.SourceFile;
import dev.changeling.source.SourceHash;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.stream.Collectors;

/**
 * One mutation run end to end: discover the project, make the mutants, compile them as a schema, run
 * the unmutated suite once, run each mutant's reaching tests, and write the results file.
 */
public final class MutationRun {

    private static final int FAILURES_LISTED = 8;

    private final RunRequest request;
    private final RunListener listener;
    private volatile WorkerPool pool;
    private volatile boolean stopped;

    public MutationRun(RunRequest request, RunListener listener) {
        this.request = request;
        this.listener = listener;
    }

    /** Runs everything; after {@link #stop()} it returns what finished, marked incomplete. */
    public RunResults execute() {
        return run();
    }

    /** Stops the run from another thread (Ctrl-C): workers are ended (asked to exit, killed if they will not) and the finished verdicts kept. */
    public void stop() {
        stopped = true;
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

    private RunResults run() {
        long started = System.nanoTime();
        Map<String, Double> timings = new LinkedHashMap<>();
        DiscoveredProject project = ProjectDiscovery.discover(request.folder(), request.discovery());
        timings.put("maven", millisSince(started));
        listener.phase("maven: " + project.build() + " (" + project.junitSetup() + ")");
        checkNotStopped();

        ProjectLayout layout = project.layout();
        long at = System.nanoTime();
        Selection selection = request.change()
                .map(change -> request.selection().narrowedTo(change.filter()))
                .orElse(request.selection());
        Selection.Chosen chosen = selection.choose(layout, request.limits());
        timings.put("generate", millisSince(at));
        listener.phase("mutants: " + chosen.mutants().size()
                + (chosen.sampled() ? " sampled from " + chosen.population() : "")
                + " " + inFiles(chosen.mutants().stream().map(Mutant::file).toList())
                + request.change().map(change -> " (" + change.description() + ")").orElse(""));
        chosen.generated().problems().forEach(problem -> listener.phase("skipped " + problem));
        checkNotStopped();

        Path work = layout.changelingDirectory();
        Path workerClasses = WorkerClasses.extract(work.resolve("worker-classes"));
        at = System.nanoTime();
        List<Path> compileClasspath = new ArrayList<>(project.compileClasspath());
        compileClasspath.add(workerClasses);
        BuildResult build = MutantBuild.compile(new BuildRequest(chosen.mutants(), chosen.generated().files(),
                compileClasspath, work.resolve("build")));
        timings.put("compile", millisSince(at));
        checkNotStopped();

        Map<String, SourceFile> files = chosen.generated().files();
        Map<String, MutantResult> results = new ConcurrentHashMap<>();
        List<Mutant> runnable = new ArrayList<>();
        for (Mutant mutant : chosen.mutants()) {
            Placement placement = build.placementOf(mutant);
            SourceFile file = files.get(mutant.file());
            switch (placement.kind()) {
                case STILLBORN -> results.put(mutant.fingerprint(), Records.of(mutant, file, Verdict.STILLBORN, placement.detail()));
                case ONCE_PER_JVM -> results.put(mutant.fingerprint(), Records.of(mutant, file, Verdict.SKIPPED, placement.detail()));
                default -> runnable.add(mutant);
            }
        }
        listener.phase("compiled: " + build.pointCount() + " points in one schema in "
                + build.timings().compileMillis() + " ms; " + build.timings().aloneCompiles() + " mutants compiled alone; "
                + count(results, Verdict.STILLBORN) + " stillborn, " + count(results, Verdict.SKIPPED) + " skipped (run once per JVM)");

        List<Path> classpath = new ArrayList<>();
        classpath.add(build.schemaClasses());
        classpath.addAll(project.testClasspath());
        SuiteConfiguration suite = project.suite();
        WorkerSettings settings = TestJvm.settings(suite, request, classpath, work.resolve("workers"), layout);
        SuiteSetup setup = TestJvm.setup(suite, request, build.pointCount(), project.productionClasses(), listener);
        List<TestRecord> tests = List.of();
        boolean complete = false;
        try (WorkerPool workers = WorkerPool.open(settings, setup)) {
            pool = workers;
            checkNotStopped();
            at = System.nanoTime();
            Baseline baseline = workers.baseline(name -> { });
            timings.put("baseline", millisSince(at));
            requireGreen(baseline, setup);
            tests = baseline.tests().stream()
                    .map(test -> new TestRecord(test.id(), test.name(), test.nanos() / 1e6))
                    .toList();
            listener.phase(String.format(java.util.Locale.ROOT, "baseline: %d tests green in %.1f s%s",
                    baseline.tests().size(), baseline.nanos() / 1e9, freshWorkers(baseline)));

            Map<String, Mutant> byKey = new HashMap<>();
            Map<String, List<String>> reaching = new HashMap<>();
            List<MutantJob> jobs = new ArrayList<>();
            for (Mutant mutant : runnable) {
                Placement placement = build.placementOf(mutant);
                List<String> reachedBy = placement.kind() == Placement.Kind.IN_SCHEMA
                        ? baseline.testsFor(placement.activation())
                        : testsForAlone(mutant, build, baseline);
                if (reachedBy.isEmpty()) {
                    results.put(mutant.fingerprint(), Records.of(mutant, files.get(mutant.file()), Verdict.UNREACHED,
                            "no test reaches this code"));
                    continue;
                }
                byKey.put(mutant.fingerprint(), mutant);
                reaching.put(mutant.fingerprint(), reachedBy);
                jobs.add(placement.kind() == Placement.Kind.IN_SCHEMA
                        ? MutantJob.schema(mutant.fingerprint(), placement.activation(), reachedBy, request.deadlines(), baseline)
                        : MutantJob.alone(mutant.fingerprint(), placement.classes(), reachedBy, request.deadlines(), baseline));
            }
            results.values().forEach(listener::finished);
            listener.running(jobs.size());
            at = System.nanoTime();
            List<JobResult> finished = workers.run(jobs, job -> {
                Mutant mutant = byKey.get(job.key());
                MutantResult result = verdictOf(mutant, files.get(mutant.file()), job, reaching.get(job.key()));
                results.put(job.key(), result);
                listener.finished(result);
            });
            timings.put("execute", millisSince(at));
            complete = !stopped && finished.size() == jobs.size();
            if (complete && request.recheckTimeouts()) {
                TimeoutRecheck.run(workers, jobs, finished, request.deadlines(),
                        key -> byKey.get(key).shortId() + " " + byKey.get(key).file(), listener);
            }
        }
        timings.put("total", millisSince(started));
        List<MutantResult> ordered = chosen.mutants().stream()
                .map(mutant -> results.get(mutant.fingerprint()))
                .filter(java.util.Objects::nonNull)
                .distinct()
                .toList();
        return new RunResults(RunResults.FORMAT, complete, settings(layout, chosen), tests, timings, ordered,
                chosen.generated().problems().stream().map(Object::toString).toList(), hashes(files, ordered));
    }

    /**
     * A mutant compiled alone has no schema switch to record its reach, so every passing test may
     * reach it: those reaching its member's other points run first, the rest after, fastest first.
     */
    private static List<String> testsForAlone(Mutant mutant, BuildResult build, Baseline baseline) {
        Point first = mutant.first();
        int[] neighbours = new int[build.points().size()];
        int count = 0;
        for (int id = 0; id < build.points().size(); id++) {
            Point point = build.points().get(id);
            if (point.file().equals(first.file()) && point.member().equals(first.member())) {
                neighbours[count++] = id;
            }
        }
        Set<String> ordered = new LinkedHashSet<>(baseline.testsFor(java.util.Arrays.copyOf(neighbours, count)));
        baseline.tests().stream()
                .filter(test -> test.status() == TestStatus.PASSED)
                .sorted(java.util.Comparator.comparingLong(RecordedTest::nanos))
                .forEach(test -> ordered.add(test.id()));
        return List.copyOf(ordered);
    }

    private static MutantResult verdictOf(Mutant mutant, SourceFile file, JobResult job, List<String> reachedBy) {
        Verdict verdict = switch (job.outcome()) {
            case KILLED -> Verdict.KILLED;
            case SURVIVED -> Verdict.SURVIVED;
            case TIMED_OUT -> Verdict.TIMED_OUT;
            case CRASHED -> Verdict.CRASHED;
        };
        MutantResult base = Records.of(mutant, file, verdict, job.message());
        List<String> ran = new ArrayList<>(job.testsRun().stream().map(TestRun::testId).toList());
        if (job.testId() != null && !ran.contains(job.testId())) {
            ran.add(job.testId());
        }
        return new MutantResult(base.id(), base.file(), base.order(), base.points(), verdict,
                verdict == Verdict.SURVIVED ? null : job.testId(), job.message(), ran, reachedBy,
                job.nanos() / 1e6, base.diff());
    }

    private static String freshWorkers(Baseline baseline) {
        int count = baseline.classesRunInFreshWorkers().size();
        return count == 0 ? "" : "; " + count + (count == 1 ? " class" : " classes")
                + " failed in a shared worker and ran again in a fresh one, as the pom runs every class in its own JVM (reuseForks=false)";
    }

    private void requireGreen(Baseline baseline, SuiteSetup setup) {
        if (baseline.tests().isEmpty()) {
            throw new UserError("no tests found in " + request.folder() + " (" + setup.testClasses().size()
                    + " test classes selected as `mvn test` selects them, none holding a test that runs);"
                    + " mutation analysis needs the project's tests", ExitCode.BASELINE_RED);
        }
        if (baseline.green()) {
            return;
        }
        List<String> failing = new ArrayList<>();
        baseline.failedContainers().forEach(container -> failing.add(container.toString()));
        baseline.failures().forEach(test -> failing.add(test.name() + (test.message() == null ? "" : " (" + firstLine(test.message()) + ")")));
        String listed = failing.stream().limit(FAILURES_LISTED).collect(Collectors.joining("; "));
        String more = failing.size() > FAILURES_LISTED ? " and " + (failing.size() - FAILURES_LISTED) + " more" : "";
        throw new UserError("the tests fail without any mutant: " + listed + more
                + ". Mutation analysis needs a green suite: fix them, or leave them out with --skip-tests CLASS_PATTERN or --skip-tag TAG",
                ExitCode.BASELINE_RED);
    }

    private RunSettings settings(ProjectLayout layout, Selection.Chosen chosen) {
        Selection selection = request.selection();
        return new RunSettings(layout.root().toString(),
                selection.request().operators().stream().map(operator -> operator.id()).toList(),
                selection.request().orders(), selection.request().scope().name().toLowerCase(java.util.Locale.ROOT),
                selection.sampleSeed(), chosen.sampled(), chosen.population(),
                request.change().map(change -> change.description()).orElse(null),
                request.workers(), request.deadlines().factor(), request.deadlines().constantMillis(),
                request.skipTests(), request.skipTags(), request.discovery().mavenArguments(), request.workerHeap().orElse(null));
    }

    private static Map<String, String> hashes(Map<String, SourceFile> files, List<MutantResult> results) {
        Map<String, String> hashes = new java.util.TreeMap<>();
        results.stream().map(MutantResult::file).distinct()
                .forEach(path -> hashes.put(path, SourceHash.sha256(files.get(path).text())));
        return hashes;
    }

    private void checkNotStopped() {
        if (stopped) {
            throw new UserError("stopped before any mutant ran; nothing was written", ExitCode.INTERRUPTED);
        }
    }

    private static long count(Map<String, MutantResult> results, Verdict verdict) {
        return results.values().stream().filter(result -> result.verdict() == verdict).count();
    }

    private static double millisSince(long startNanos) {
        return (System.nanoTime() - startNanos) / 1e6;
    }

    private static String firstLine(String text) {
        int newline = text.indexOf('\n');
        return newline < 0 ? text : text.substring(0, newline);
    }
}
