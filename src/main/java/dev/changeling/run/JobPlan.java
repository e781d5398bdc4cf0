package dev.changeling.run;

import dev.changeling.compile.BuildResult;
import dev.changeling.compile.Placement;
import dev.changeling.execution.Baseline;
import dev.changeling.execution.Deadlines;
import dev.changeling.execution.JobResult;
import dev.changeling.execution.MutantJob;
import dev.changeling.execution.RecordedTest;
import dev.changeling.execution.TestRun;
import dev.changeling.execution.TestStatus;
import dev.changeling.mutant.Mutant;
import dev.changeling.mutant.Point;
import dev.changeling.recall.Recall;
import dev.changeling.recall.VerdictKeys;
import dev.changeling.results.MutantResult;
import dev.changeling.results.Records;
import dev.changeling.results.Verdict;
import dev.changeling.source.SourceFile;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * What the baseline decided for each runnable mutant: the tests that reach it, in the order they run, as one
 * job for the workers; a mutant no test reaches is unreached without running anything. Of a watched mutant's
 * reaching tests only those that saw its expression give another value run: the others execute exactly what
 * they executed unmutated, so they pass again; a watched mutant that no test infected survives without running.
 *
 * @param jobs      one per reached mutant
 * @param mutants   each job's mutant, by fingerprint
 * @param reachedBy  each job's reaching tests, by fingerprint
 * @param infectedBy each watched job's tests that saw its mutated expression differ in the baseline, by fingerprint
 * @param settled    verdicts the baseline alone decides, by fingerprint: the mutants no test reaches, and the
 *                   watched ones that no reaching test infected
 * @param everyTest  whether each job runs every reaching test, and each result keeps every killer
 */
record JobPlan(List<MutantJob> jobs, Map<String, Mutant> mutants, Map<String, List<String>> reachedBy,
               Map<String, List<String>> infectedBy, Map<String, MutantResult> settled, boolean everyTest) {

    static JobPlan of(List<Mutant> runnable, BuildResult build, Baseline baseline, Deadlines deadlines,
                      Map<String, SourceFile> files, boolean everyTest) {
        List<MutantJob> jobs = new ArrayList<>();
        Map<String, Mutant> mutants = new HashMap<>();
        Map<String, List<String>> reachedBy = new HashMap<>();
        Map<String, List<String>> infectedBy = new HashMap<>();
        Map<String, MutantResult> settled = new LinkedHashMap<>();
        for (Mutant mutant : runnable) {
            Placement placement = build.placementOf(mutant);
            boolean inSchema = placement.kind() == Placement.Kind.IN_SCHEMA;
            List<String> tests = inSchema ? baseline.testsFor(placement.activation()) : testsForAlone(mutant, build, baseline);
            if (tests.isEmpty()) {
                settled.put(mutant.fingerprint(), Records.of(mutant, files.get(mutant.file()), Verdict.UNREACHED,
                        "no test reaches this code"));
                continue;
            }
            List<String> toRun = tests;
            if (inSchema && mutant.order() == 1 && build.watches(placement.activation()[0])) {
                List<String> infected = baseline.testsFor(build.pointCount() + placement.activation()[0]);
                if (infected.isEmpty()) {
                    settled.put(mutant.fingerprint(), notInfected(mutant, files.get(mutant.file()), tests));
                    continue;
                }
                infectedBy.put(mutant.fingerprint(), infected);
                Set<String> infecting = Set.copyOf(infected);
                toRun = tests.stream().filter(infecting::contains).toList();
            }
            mutants.put(mutant.fingerprint(), mutant);
            reachedBy.put(mutant.fingerprint(), tests);
            MutantJob job = inSchema
                    ? MutantJob.schema(mutant.fingerprint(), placement.activation(), toRun, deadlines, baseline)
                    : MutantJob.alone(mutant.fingerprint(), placement.classes(), toRun, deadlines, baseline);
            jobs.add(everyTest ? job.runningEveryTest() : job);
        }
        return new JobPlan(jobs, mutants, reachedBy, infectedBy, settled, everyTest);
    }

    /**
     * The plan less the jobs whose verdicts an earlier run found with the same inputs; those verdicts join the settled
     * ones.
     */
    JobPlan recalling(Recall recall, VerdictKeys keys, Map<String, SourceFile> files) {
        List<MutantJob> left = new ArrayList<>();
        Map<String, MutantResult> known = new LinkedHashMap<>(settled);
        for (MutantJob job : jobs) {
            Mutant mutant = mutants.get(job.key());
            recall.verdict(mutant, files.get(mutant.file()), job.tests(), everyTest, keys, reachedBy.get(job.key()),
                            infectedBy.get(job.key()))
                    .ifPresentOrElse(result -> known.put(job.key(), result), () -> left.add(job));
        }
        return new JobPlan(left, mutants, reachedBy, infectedBy, known, everyTest);
    }

    /** Keeps the verdict of a job that ran, for later runs. */
    void keep(JobResult job, MutantResult result, Recall recall, VerdictKeys keys, Map<String, SourceFile> files) {
        Mutant mutant = mutants.get(result.id());
        recall.keep(mutant, files.get(mutant.file()), result, job.entered() == null ? null : keys.namesOf(job.entered()),
                everyTest, keys);
    }

    /** A watched mutant whose expression gave the original's value for every reaching test: it survives them all. */
    private static MutantResult notInfected(Mutant mutant, SourceFile file, List<String> reachedBy) {
        MutantResult base = Records.of(mutant, file, Verdict.SURVIVED,
                "no reaching test made the expression give another value, so none ran again");
        return new MutantResult(base.id(), base.file(), base.order(), base.points(), Verdict.SURVIVED, null, base.detail(),
                List.of(), reachedBy, 0, base.diff(), null, List.of());
    }

    /**
     * The verdict of a job the workers finished, as the results file records it; with every test run, its killers are
     * every test that failed, those before a timeout or a crash included (none of a step stopped at its deadline).
     */
    MutantResult resultOf(JobResult job, Map<String, SourceFile> files) {
        Mutant mutant = mutants.get(job.key());
        Verdict verdict = switch (job.outcome()) {
            case KILLED -> Verdict.KILLED;
            case SURVIVED -> Verdict.SURVIVED;
            case TIMED_OUT -> Verdict.TIMED_OUT;
            case CRASHED -> Verdict.CRASHED;
        };
        MutantResult base = Records.of(mutant, files.get(mutant.file()), verdict, job.message());
        List<String> ran = new ArrayList<>(job.testsRun().stream().map(TestRun::testId).toList());
        if (job.testId() != null && !ran.contains(job.testId())) {
            ran.add(job.testId());
        }
        return new MutantResult(base.id(), base.file(), base.order(), base.points(), verdict,
                verdict == Verdict.SURVIVED ? null : job.testId(), job.message(), ran, reachedBy.get(job.key()),
                job.nanos() / 1e6, base.diff(), everyTest ? job.failedTests() : null, infectedBy.get(job.key()));
    }

    /** A short name of a job's mutant for progress lines: its id and file. */
    String label(String key) {
        Mutant mutant = mutants.get(key);
        return mutant.shortId() + " " + mutant.file();
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
        Set<String> ordered = new LinkedHashSet<>(baseline.testsFor(Arrays.copyOf(neighbours, count)));
        baseline.tests().stream()
                .filter(test -> test.status() == TestStatus.PASSED)
                .sorted(Comparator.comparingLong(RecordedTest::nanos))
                .forEach(test -> ordered.add(test.id()));
        return List.copyOf(ordered);
    }
}
