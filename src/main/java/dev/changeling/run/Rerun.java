package dev.changeling.run;

import dev.changeling.UserError;
import dev.changeling.execution.Deadlines;
import dev.changeling.execution.WorkerSettings;
import dev.changeling.mutant.HigherOrder;
import dev.changeling.mutant.MutantRequest;
import dev.changeling.mutant.Selection;
import dev.changeling.operator.Operators;
import dev.changeling.project.DiscoveryOptions;
import dev.changeling.results.MutantResult;
import dev.changeling.results.PointRecord;
import dev.changeling.results.RunResults;
import dev.changeling.results.RunSettings;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Collectors;

/**
 * Runs one mutant of an earlier run again, through the same engine, against the code and tests as
 * they are now: the project is rebuilt, the suite's baseline taken again, and only that mutant run.
 */
public final class Rerun {

    private final Path projectRoot;
    private final RunSettings settings;

    public Rerun(Path projectRoot, RunResults earlier) {
        this.projectRoot = projectRoot;
        this.settings = earlier.settings();
    }

    /** The mutant run again with the tests that reach it today; a {@link UserError} when it cannot be. */
    public MutantResult rerun(MutantResult mutant) {
        Set<String> points = mutant.points().stream().map(PointRecord::fingerprint).collect(Collectors.toSet());
        MutantRequest request;
        try {
            request = new MutantRequest(Operators.named(settings.operators()), List.of(mutant.order()),
                    HigherOrder.Scope.valueOf(settings.scope().toUpperCase(Locale.ROOT)), settings.seed(),
                    point -> points.contains(point.fingerprint()));
        } catch (IllegalArgumentException e) {
            throw new UserError("cannot run " + mutant.shortId() + " again: " + e.getMessage());
        }
        RunRequest again = new RunRequest(projectRoot, List.of(), new Selection(request, null, null, settings.seed()),
                Optional.empty(), DiscoveryOptions.defaults().withMavenArguments(settings.mavenArguments()), 1,
                new Deadlines(settings.timeFactor(), settings.timeExtraMillis()),
                Optional.ofNullable(settings.workerHeap()),
                WorkerSettings.DEFAULT_MUTANTS_PER_WORKER, settings.skipTests(), settings.skipTags(), false);
        RunResults results = new MutationRun(again, RunListener.SILENT).execute();
        return results.mutants().stream()
                .filter(result -> result.id().equals(mutant.id()))
                .findFirst()
                .orElseThrow(() -> new UserError("mutant " + mutant.shortId() + " no longer exists: the code it changed in "
                        + mutant.file() + " is different now; run 'changeling run' again to see the mutants of the new code"));
    }
}
