package dev.changeling.run;

import dev.changeling.execution.Deadlines;
import dev.changeling.mutant.Selection;
import dev.changeling.project.DiscoveryOptions;
import dev.changeling.scope.ChangeScope;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

/**
 * How a run is asked for.
 *
 * @param folder           the project folder
 * @param limits           files and folders inside it to limit mutation to; empty for the whole project
 * @param selection        which mutants to make
 * @param change           the change under review to limit mutation to, if any
 * @param discovery        how to find classes and the test classpath
 * @param workers          worker JVMs at once
 * @param deadlines        how long a mutant's tests may take
 * @param workerHeap       each worker's {@code -Xmx} when given; else the one the pom's test JVM options set, else 2g
 * @param mutantsPerWorker how many mutants a worker runs before it is replaced
 * @param skipTests        test class patterns to leave out
 * @param skipTags         JUnit tags to leave out
 * @param recheckTimeouts  whether every timed-out mutant runs again afterwards with ten times its deadline, to
 *                         see whether the deadlines were long enough
 */
public record RunRequest(
        Path folder,
        List<Path> limits,
        Selection selection,
        Optional<ChangeScope> change,
        DiscoveryOptions discovery,
        int workers,
        Deadlines deadlines,
        Optional<String> workerHeap,
        int mutantsPerWorker,
        List<String> skipTests,
        List<String> skipTags,
        boolean recheckTimeouts) {

    public RunRequest {
        limits = List.copyOf(limits);
        skipTests = List.copyOf(skipTests);
        skipTags = List.copyOf(skipTags);
    }
}
