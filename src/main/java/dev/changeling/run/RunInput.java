package dev.changeling.run;

import dev.changeling.ExitCode;
import dev.changeling.UserError;
import dev.changeling.execution.Deadlines;
import dev.changeling.execution.WorkerSettings;
import dev.changeling.mutant.SelectionInput;
import dev.changeling.mutant.Shard;
import dev.changeling.project.CodeModule;
import dev.changeling.project.DiscoveryOptions;
import dev.changeling.project.ExplicitProject;
import dev.changeling.project.ProjectLayout;
import dev.changeling.scope.ChangeSpec;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

/**
 * A run as the user typed it. {@link #resolve()} is the one place that turns it into a {@link RunRequest}: it
 * locates the layout, checks every value and fills in the defaults.
 *
 * @param paths            the project folder, or files and folders inside it; empty for the current folder
 * @param explicit         the project's folders and classpath given by hand, if any
 * @param selection        which mutants to make
 * @param change           the change to limit mutation to, if any
 * @param mavenArguments   extra arguments for every mvn call
 * @param workers          worker JVMs at once, or null for one per core
 * @param timeFactor       the deadline factor over the tests' baseline time
 * @param timeExtraMillis  the constant added to every deadline
 * @param workerHeap       each worker's heap (such as 512m), or null for the pom's or the default
 * @param mutantsPerWorker mutants a worker runs before it is replaced
 * @param skipTests        test class patterns to leave out
 * @param skipTags         JUnit tags to leave out
 * @param recheckTimeouts  whether timed-out mutants run again with ten times their deadline afterwards
 * @param everyTest        whether every reaching test runs against every mutant (the full kill matrix)
 * @param shard            the share of the mutants to run as typed ({@link Shard#FORM}), or null for all
 * @param module           the one module of a multi-module build to analyse ({@code --module}), or null for every one
 * @param reuse            what to take from earlier runs (kept verdicts, a reach map), as typed
 */
public record RunInput(List<Path> paths, Optional<ExplicitProject> explicit, SelectionInput selection,
                       Optional<ChangeSpec> change, List<String> mavenArguments, Integer workers, double timeFactor,
                       long timeExtraMillis, String workerHeap, int mutantsPerWorker, List<String> skipTests,
                       List<String> skipTags, boolean recheckTimeouts, boolean everyTest, String shard,
                       String module, Reuse reuse) {

    public RunInput {
        paths = List.copyOf(paths);
        mavenArguments = List.copyOf(mavenArguments);
        skipTests = List.copyOf(skipTests);
        skipTags = List.copyOf(skipTags);
    }

    /**
     * The complete request.
     *
     * @throws UserError with exit code 2 naming the option whose value cannot be used, or 1 when the project
     *                   cannot be located
     */
    public RunRequest resolve() {
        Deadlines deadlines;
        try {
            deadlines = new Deadlines(timeFactor, timeExtraMillis);
        } catch (IllegalArgumentException e) {
            throw usage("--time-factor/--time-extra: " + e.getMessage());
        }
        if (workerHeap != null && !WorkerSettings.isHeapSize(workerHeap)) {
            throw usage("--worker-heap takes a size such as 512m or 2g, not '" + workerHeap + "'");
        }
        int workerCount = workers == null ? Runtime.getRuntime().availableProcessors() : workers;
        if (workerCount < 1) {
            throw usage("--workers takes a positive number, not " + workerCount);
        }
        if (mutantsPerWorker < 1) {
            throw usage("--mutants-per-worker takes a positive number, not " + mutantsPerWorker);
        }
        Optional<Shard> share = parsedShard();
        ProjectLayout layout = ProjectLayout.locate(paths, explicit);
        Optional<String> picked = Optional.ofNullable(module).map(path -> CodeModule.named(layout.root(), path).path());
        DiscoveryOptions discovery = new DiscoveryOptions(Optional.empty(), mavenArguments, explicit);
        return new RunRequest(layout, layout.limits(paths), ProjectSelection.of(selection, change.isPresent(), layout), change, discovery, workerCount, deadlines,
                Optional.ofNullable(workerHeap), mutantsPerWorker, skipTests, skipTags, recheckTimeouts, everyTest, share, picked, reused(share));
    }

    /** What to take from earlier runs; a reach map given by hand must exist, and a run that only maps must map it all. */
    private Reuse reused(Optional<Shard> share) {
        reuse.reachMap().filter(file -> !Files.isRegularFile(file)).ifPresent(file -> {
            throw new UserError(file + ": no such reach map; give the " + "reach-map.json a whole run wrote in its build folder"
                    + " (target/changeling/), or leave --reach-map out");
        });
        if (reuse.mapOnly() && (change.isPresent() || share.isPresent() || selection.sample() != null || selection.margin() != null
                || selection.mix() != null || !selection.fileGlobs().isEmpty() || !selection.orders().contains(1)
                || !paths.stream().allMatch(Files::isDirectory))) {
            throw usage("--map-only maps the whole project: leave out --changed-since, --uncommitted, --diff-file, --sample,"
                    + " --mix, --files, --shard and file paths, and keep order 1");
        }
        return reuse;
    }

    private Optional<Shard> parsedShard() {
        if (shard == null) {
            return Optional.empty();
        }
        try {
            return Optional.of(Shard.parse(shard));
        } catch (IllegalArgumentException e) {
            throw usage("--shard '" + shard + "': " + e.getMessage() + "; give " + Shard.FORM
                    + ", shard I of N, such as --shard 2/3");
        }
    }

    private static UserError usage(String message) {
        return new UserError(message, ExitCode.USAGE);
    }
}
