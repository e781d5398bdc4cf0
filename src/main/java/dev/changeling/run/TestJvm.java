package dev.changeling.run;

import dev.changeling.ExitCode;
import dev.changeling.UserError;
import dev.changeling.execution.Baseline;
import dev.changeling.execution.ClassPatterns;
import dev.changeling.execution.SuiteSetup;
import dev.changeling.execution.WorkerSettings;
import dev.changeling.project.ProjectLayout;
import dev.changeling.project.SuiteConfiguration;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Predicate;

/**
 * The suite and the test JVM as the project's build has them, with the user's own additions on top
 * ({@code --skip-tests}, {@code --skip-tag}, {@code --worker-heap}): what the workers are told.
 */
final class TestJvm {

    private TestJvm() {
    }

    /** The workers' JVM: the build's working directory, options, properties and environment; the heap the user or the build says. */
    static WorkerSettings settings(SuiteConfiguration suite, RunRequest request, List<Path> classpath, Path workDirectory,
                                   ProjectLayout layout) {
        Path workingDirectory = existingWorkingDirectory(suite.workingDirectory(), layout);
        return WorkerSettings.builder(workingDirectory, classpath, workDirectory)
                .workers(request.workers())
                .maxHeap(request.workerHeap().or(suite::maxHeap).orElse(WorkerSettings.DEFAULT_MAX_HEAP))
                .mutantsPerWorker(request.mutantsPerWorker())
                .jvmArguments(suite.jvmArguments())
                .systemProperties(suite.systemProperties())
                .environment(suite.environment())
                .build();
    }

    /** The test classes and tags: the build's, less what the user leaves out; said in one line, with any notices. */
    static SuiteSetup setup(SuiteConfiguration suite, RunRequest request, int pointCount, List<String> productionClasses,
                            RunListener listener) {
        suite.skipReason().ifPresent(reason -> {
            throw new UserError(request.layout().root() + ": `mvn test` runs no tests here (" + reason + "), so there is nothing to"
                    + " run the mutants against; remove the setting or run with --maven-arg=-DskipTests=false", ExitCode.USER_ERROR);
        });
        Predicate<String> skipped = ClassPatterns.anyOf(request.skipTests());
        List<String> classes = suite.testClasses().stream().filter(skipped.negate()).toList();
        List<String> excludedTags = new ArrayList<>(suite.excludedTags());
        excludedTags.addAll(request.skipTags());
        int leftOut = suite.testClasses().size() - classes.size();
        listener.phase("tests: " + suite.summary()
                + (leftOut > 0 ? "; " + leftOut + " left out by --skip-tests" : "")
                + (request.skipTags().isEmpty() ? "" : "; tags left out by --skip-tag: " + String.join(", ", request.skipTags())));
        suite.notices().forEach(notice -> listener.phase("tests: note: " + notice));
        request.skipTests().stream()
                .filter(pattern -> suite.testClasses().stream().noneMatch(ClassPatterns.matching(pattern)))
                .forEach(pattern -> listener.phase("tests: note: --skip-tests '" + pattern + "' matches no test class"));
        return SuiteSetup.of(pointCount, classes)
                .withPreinitialise(productionClasses)
                .withTags(suite.includedTags(), excludedTags)
                .withConfigurationParameters(suite.configurationParameters())
                .withFreshJvmPerClass(suite.freshJvmPerClass());
    }

    /**
     * One notice per {@code --skip-tag} that left out no test. Which tags the tests carry is known only once the
     * baseline has discovered them, so this comes after it, and before a red baseline is reported, as a mistyped
     * tag is a likely reason for one.
     */
    static void noteUnusedSkipTags(RunRequest request, Baseline baseline, RunListener listener) {
        request.skipTags().stream()
                .filter(tag -> !baseline.tagsThatLeftOutTests().contains(tag))
                .forEach(tag -> listener.phase("tests: note: --skip-tag '" + tag + "' matches no test"));
    }

    /**
     * The build makes a missing working directory; the tool does so only below the build directory, as it
     * writes nothing in the source tree.
     */
    private static Path existingWorkingDirectory(Path folder, ProjectLayout layout) {
        if (Files.isDirectory(folder)) {
            return folder;
        }
        if (!folder.startsWith(layout.buildDirectory())) {
            throw new UserError(folder + ": the pom's Surefire workingDirectory does not exist; create it (`mvn test` would)"
                    + " or change the setting");
        }
        try {
            return Files.createDirectories(folder);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
