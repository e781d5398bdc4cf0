package dev.changeling.run;

import dev.changeling.UserError;
import dev.changeling.execution.Deadlines;
import dev.changeling.execution.WorkerSettings;
import dev.changeling.mutant.HigherOrder;
import dev.changeling.mutant.LineBudget;
import dev.changeling.mutant.MutantRequest;
import dev.changeling.mutant.Point;
import dev.changeling.mutant.Selection;
import dev.changeling.mutant.Shard;
import dev.changeling.mutant.Suppressions;
import dev.changeling.operator.MutationOperator;
import dev.changeling.operator.Operators;
import dev.changeling.project.DiscoveryOptions;
import dev.changeling.project.ProjectLayout;
import dev.changeling.results.RunSettings;
import dev.changeling.scope.ChangeSpec;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.function.Predicate;

/**
 * How a run is asked for, complete and immutable. The results file keeps it ({@link #settings}), and a re-run of
 * one mutant rebuilds it from there ({@link #again}), so both run the same project the same way.
 *
 * @param layout           the project's folders, located once
 * @param limits           files and folders inside it to limit mutation to; empty for the whole project
 * @param selection        which mutants to make
 * @param change           the change under review to limit mutation to, if any (read once the project is known)
 * @param discovery        how to find classes and the test classpath
 * @param workers          worker JVMs at once
 * @param deadlines        how long a mutant's tests may take
 * @param workerHeap       each worker's {@code -Xmx} when given; else the one the pom's test JVM options set, else 2g
 * @param mutantsPerWorker how many mutants a worker runs before it is replaced
 * @param skipTests        test class patterns to leave out
 * @param skipTags         JUnit tags to leave out
 * @param recheckTimeouts  whether every timed-out mutant runs again afterwards with ten times its deadline, to
 *                         see whether the deadlines were long enough
 * @param everyTest        whether every reaching test runs against every mutant, for the full kill matrix, rather than
 *                         stopping at the first failure
 * @param shard            the share of the chosen mutants this run runs, when the run is cut into shards
 * @param module           the one module of a multi-module build to analyse, by its path from the root; empty for
 *                         every module with tests of its own (and for a project of one module)
 * @param reuse            what the run takes from earlier runs: kept verdicts, the reach map
 */
public record RunRequest(
        ProjectLayout layout,
        List<Path> limits,
        Selection selection,
        Optional<ChangeSpec> change,
        DiscoveryOptions discovery,
        int workers,
        Deadlines deadlines,
        Optional<String> workerHeap,
        int mutantsPerWorker,
        List<String> skipTests,
        List<String> skipTags,
        boolean recheckTimeouts,
        boolean everyTest,
        Optional<Shard> shard,
        Optional<String> module,
        Reuse reuse) {

    public RunRequest {
        limits = List.copyOf(limits);
        skipTests = List.copyOf(skipTests);
        skipTags = List.copyOf(skipTags);
    }

    /** What the results file keeps of the request, with what choosing the mutants found. */
    RunSettings settings(Selection.Chosen chosen, Optional<String> changeDescription) {
        MutantRequest mutants = selection.request();
        return new RunSettings(layout.root().toString(),
                mutants.operators().stream().map(MutationOperator::id).toList(),
                mutants.orders(), mutants.scope().name().toLowerCase(Locale.ROOT),
                selection.sampleSeed(), chosen.sampled(), chosen.population(), changeDescription.orElse(null),
                workers, deadlines.factor(), deadlines.constantMillis(), skipTests, skipTags, discovery.mavenArguments(),
                workerHeap.orElse(null), discovery.mavenExecutable().map(Path::toString).orElse(null),
                discovery.explicitProject().orElse(null), mutantsPerWorker, mutants.mutateDiagnostics(),
                mutants.budget().perLine(), everyTest, selection.mix());
    }

    /**
     * The request an earlier run was made with, for the points {@code only} picks of one order, in one worker:
     * the same project found the same way, the same operators, deadlines, heap, tests, per-line budget (the points
     * picked were kept under it, so it keeps them all again, whatever ranks them now) and kill matrix or not; in a
     * multi-module build, only the module that holds them ({@code module}).
     *
     * @throws UserError when the recorded settings no longer make sense (an operator that is gone)
     */
    static RunRequest again(Path projectRoot, RunSettings recorded, Optional<String> module, int order, Predicate<Point> only) {
        MutantRequest request;
        try {
            request = new MutantRequest(Operators.named(recorded.operators()), List.of(order),
                    HigherOrder.Scope.valueOf(recorded.scope().toUpperCase(Locale.ROOT)), recorded.seed(), only,
                    recorded.mutateDiagnostics()).withSuppressions(Suppressions.load(projectRoot))
                    .withBudget(new LineBudget(recorded.perLine(), Map.of()));
        } catch (IllegalArgumentException e) {
            throw new UserError("cannot run the mutant again: " + e.getMessage());
        }
        DiscoveryOptions discovery = new DiscoveryOptions(Optional.ofNullable(recorded.mavenExecutable()).map(Path::of),
                recorded.mavenArguments(), Optional.ofNullable(recorded.explicitProject()));
        return new RunRequest(ProjectLayout.locate(projectRoot, discovery.explicitProject()), List.of(),
                Selection.all(request, recorded.seed()), Optional.empty(), discovery, 1,
                new Deadlines(recorded.timeFactor(), recorded.timeExtraMillis()), Optional.ofNullable(recorded.workerHeap()),
                recorded.mutantsPerWorker() > 0 ? recorded.mutantsPerWorker() : WorkerSettings.DEFAULT_MUTANTS_PER_WORKER,
                recorded.skipTests(), recorded.skipTags(), false, recorded.everyTest(), Optional.empty(), module, Reuse.DEFAULT);
    }
}
