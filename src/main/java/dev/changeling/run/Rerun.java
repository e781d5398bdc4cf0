package dev.changeling.run;

import dev.changeling.UserError;
import dev.changeling.results.ModuleRecord;
import dev.changeling.results.MutantResult;
import dev.changeling.results.PointRecord;
import dev.changeling.results.RunResults;
import dev.changeling.results.RunSettings;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.function.Consumer;
import java.util.stream.Collectors;

/**
 * Runs one mutant of an earlier run again, through the same engine, against the code and tests as
 * they are now: the project (in a multi-module build, the mutant's module) is rebuilt, the suite's baseline taken
 * again, and only that mutant run.
 */
public final class Rerun {

    /** The phases that take a while, in words; finding the mutant's points again is quick and goes unsaid. */
    private static final Map<String, String> STEPS = Map.of(
            PhaseClock.MAVEN, "building the project",
            PhaseClock.COMPILE, "compiling the mutant",
            PhaseClock.BASELINE, "running the tests without the mutant, to find those that reach it",
            PhaseClock.EXECUTE, "running the tests that reach it, with the mutant");

    private final Path projectRoot;
    private final RunSettings settings;
    private final List<ModuleRecord> modules;

    public Rerun(Path projectRoot, RunResults earlier) {
        this.projectRoot = projectRoot;
        this.settings = earlier.settings();
        this.modules = earlier.modules();
    }

    /** The mutant run again with the tests that reach it today; a {@link UserError} when it cannot be. */
    public MutantResult rerun(MutantResult mutant) {
        return rerun(mutant, step -> { });
    }

    /**
     * The same, saying each slow step in a few words as it starts (such as "building the project"), for
     * someone waiting on it.
     */
    public MutantResult rerun(MutantResult mutant, Consumer<String> steps) {
        Set<String> points = mutant.points().stream().map(PointRecord::fingerprint).collect(Collectors.toSet());
        Optional<String> module = modules.stream().filter(one -> one.holds(mutant.file())).map(ModuleRecord::path).findFirst();
        RunRequest again = RunRequest.again(projectRoot, settings, module, mutant.order(), point -> points.contains(point.fingerprint()));
        RunResults results = new MutationRun(again, announcing(steps)).execute();
        return results.mutants().stream()
                .filter(result -> result.id().equals(mutant.id()))
                .findFirst()
                .orElseThrow(() -> new UserError("mutant " + mutant.shortId() + " no longer exists: the code it changed in "
                        + mutant.file() + " is different now; run 'changeling run' again to see the mutants of the new code"));
    }

    /** A listener that puts the phases of a run of one mutant into words, for {@code steps}. */
    static RunListener announcing(Consumer<String> steps) {
        return new RunListener() {
            @Override
            public void starting(String phase) {
                String words = STEPS.get(phase);
                if (words != null) {
                    steps.accept(words);
                }
            }
        };
    }
}
