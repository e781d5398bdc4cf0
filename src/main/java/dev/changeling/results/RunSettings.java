package dev.changeling.results;

import dev.changeling.mutant.MixedSample;
import dev.changeling.project.ExplicitProject;
import java.util.List;

/**
 * How a run was asked for, as resolved ({@code run.RunRequest}): kept so that its figures can be read correctly
 * later, and so that one mutant can be run again exactly as the run ran it.
 *
 * @param project     the project directory, absolute
 * @param operators   the operator ids used
 * @param orders      the mutant orders generated (1 = first-order)
 * @param scope       where the points of one k-order mutant come from
 * @param seed        the seed of k-order combination and sampling
 * @param sampled     whether the mutants are a sample of a larger population
 * @param population  how many mutants there were before sampling
 * @param changeScope the change the run was limited to, or null for the whole project
 * @param workers     worker JVMs
 * @param timeFactor  deadline factor over the baseline time of the tests run
 * @param timeExtraMillis constant added to every deadline
 * @param skipTests   test class patterns left out
 * @param skipTags    JUnit tags left out
 * @param mavenArguments extra arguments given to every mvn call
 * @param workerHeap  each worker's heap as given, or null when the pom's or the default applied
 * @param mavenExecutable the mvn given, or null for the one found on MAVEN_HOME or PATH
 * @param explicitProject the folders and classpath given by hand, or null when Maven found them
 * @param mutantsPerWorker mutants a worker runs before it is replaced (0 in files written before it was kept)
 * @param mutateDiagnostics whether code whose only effect is diagnostics was mutated too
 * @param perLine     mutants kept on each changed line of a run scoped to a change; 0 when every one was made
 * @param everyTest   whether every reaching test ran against every mutant (the full kill matrix, kept in each
 *                    mutant's {@code killers}), not stopping at the first failure
 * @param mix         the mixed sample of first-order and k-order mutants (with the latter's parts), or null
 */
public record RunSettings(
        String project,
        List<String> operators,
        List<Integer> orders,
        String scope,
        long seed,
        boolean sampled,
        int population,
        String changeScope,
        int workers,
        double timeFactor,
        long timeExtraMillis,
        List<String> skipTests,
        List<String> skipTags,
        List<String> mavenArguments,
        String workerHeap,
        String mavenExecutable,
        ExplicitProject explicitProject,
        int mutantsPerWorker,
        boolean mutateDiagnostics,
        int perLine,
        boolean everyTest,
        MixedSample mix) {

    public RunSettings {
        skipTests = skipTests == null ? List.of() : List.copyOf(skipTests);
        skipTags = skipTags == null ? List.of() : List.copyOf(skipTags);
        mavenArguments = mavenArguments == null ? List.of() : List.copyOf(mavenArguments);
    }
}
