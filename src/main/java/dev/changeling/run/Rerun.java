package dev.changeling.run;

import dev.changeling.UserError;
import dev.changeling.results.MutantResult;
import dev.changeling.results.PointRecord;
import dev.changeling.results.RunResults;
import dev.changeling.results.RunSettings;
import java.nio.file.Path;
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
        RunRequest again = RunRequest.again(projectRoot, settings, mutant.order(), point -> points.contains(point.fingerprint()));
        RunResults results = new MutationRun(again, RunListener.SILENT).execute();
        return results.mutants().stream()
                .filter(result -> result.id().equals(mutant.id()))
                .findFirst()
                .orElseThrow(() -> new UserError("mutant " + mutant.shortId() + " no longer exists: the code it changed in "
                        + mutant.file() + " is different now; run 'changeling run' again to see the mutants of the new code"));
    }
}
