package dev.changeling.execution;

import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Objects;

/**
 * How worker JVMs are started.
 *
 * @param projectDirectory  the working directory of every worker (tests open files relative to it)
 * @param classpath         the project's test classpath in order, schema classes ahead of the project's own
 * @param workDirectory     where the workers' logs, temp folders and the worker classes go (below the build directory)
 * @param workers           worker JVMs running at once
 * @param mutantsPerWorker  a worker is replaced after this many mutants, so leaked threads and static state do not pile up
 * @param maxHeap           the {@code -Xmx} value, e.g. {@code 2g}, so results do not depend on the machine's memory
 * @param exitOnOutOfMemory whether a worker stops at its first OutOfMemoryError (reported as crashed) instead of
 *                          limping on with a broken heap
 * @param jvmArguments      more JVM options, after ours
 * @param javaExecutable    the {@code java} to start
 * @param startTimeout      how long starting a worker and preparing it may take
 * @param baselineTimeout   how long the unmutated suite may take
 */
public record WorkerSettings(Path projectDirectory, List<Path> classpath, Path workDirectory, int workers,
                             int mutantsPerWorker, String maxHeap, boolean exitOnOutOfMemory, List<String> jvmArguments,
                             Path javaExecutable, Duration startTimeout, Duration baselineTimeout) {

    public static final String DEFAULT_MAX_HEAP = "2g";
    /**
     * Options every worker starts with, ahead of {@code jvmArguments} (which may override them): the client
     * compiler only, as unit tests are short and each mutant's switch deoptimises code that the optimising
     * compiler would spend far longer recompiling than the tests run; and the serial collector, as a worker
     * runs one test at a time and collector threads would only compete with the other workers for the cores.
     * On commons-cli's suite the two took the execution of three files' mutants from 37.6 s to 23.5 s.
     */
    public static final List<String> TUNING = List.of("-XX:TieredStopAtLevel=1", "-XX:+UseSerialGC");
    /**
     * A fresh worker costs 0.5–2 s (start, class initialisation, a cold JIT) against a few milliseconds
     * per mutant in a warm one, so replacing it often is dear; after 500 mutants that is a few percent,
     * and memory a leaky suite piles up per run, or threads it leaves behind, stay bounded.
     */
    public static final int DEFAULT_MUTANTS_PER_WORKER = 500;

    public WorkerSettings {
        Objects.requireNonNull(projectDirectory, "projectDirectory");
        classpath = List.copyOf(classpath);
        Objects.requireNonNull(workDirectory, "workDirectory");
        if (workers < 1) {
            throw new IllegalArgumentException("at least one worker is needed, not " + workers);
        }
        if (mutantsPerWorker < 1) {
            throw new IllegalArgumentException("a worker must run at least one mutant before it is replaced, not " + mutantsPerWorker);
        }
        if (!maxHeap.matches("[0-9]+[kKmMgGtT]?")) {
            throw new IllegalArgumentException("the worker heap must be a size such as 512m or 2g, not '" + maxHeap + "'");
        }
        jvmArguments = List.copyOf(jvmArguments);
        Objects.requireNonNull(javaExecutable, "javaExecutable");
        Objects.requireNonNull(startTimeout, "startTimeout");
        Objects.requireNonNull(baselineTimeout, "baselineTimeout");
    }

    /** One worker per core, 2 GiB heap each, the tool's own {@code java}. */
    public static WorkerSettings of(Path projectDirectory, List<Path> classpath, Path workDirectory) {
        return new WorkerSettings(projectDirectory.toAbsolutePath().normalize(), classpath, workDirectory.toAbsolutePath().normalize(),
                Runtime.getRuntime().availableProcessors(), DEFAULT_MUTANTS_PER_WORKER, DEFAULT_MAX_HEAP, true, List.of(),
                currentJava(), Duration.ofMinutes(2), Duration.ofHours(1));
    }

    public static Path currentJava() {
        boolean windows = System.getProperty("os.name", "").toLowerCase(java.util.Locale.ROOT).startsWith("windows");
        return Path.of(System.getProperty("java.home"), "bin", windows ? "java.exe" : "java");
    }

    public WorkerSettings withWorkers(int count) {
        return new WorkerSettings(projectDirectory, classpath, workDirectory, count, mutantsPerWorker, maxHeap,
                exitOnOutOfMemory, jvmArguments, javaExecutable, startTimeout, baselineTimeout);
    }

    public WorkerSettings withMutantsPerWorker(int count) {
        return new WorkerSettings(projectDirectory, classpath, workDirectory, workers, count, maxHeap,
                exitOnOutOfMemory, jvmArguments, javaExecutable, startTimeout, baselineTimeout);
    }

    public WorkerSettings withMaxHeap(String size) {
        return new WorkerSettings(projectDirectory, classpath, workDirectory, workers, mutantsPerWorker, size,
                exitOnOutOfMemory, jvmArguments, javaExecutable, startTimeout, baselineTimeout);
    }

    public WorkerSettings withExitOnOutOfMemory(boolean exit) {
        return new WorkerSettings(projectDirectory, classpath, workDirectory, workers, mutantsPerWorker, maxHeap,
                exit, jvmArguments, javaExecutable, startTimeout, baselineTimeout);
    }

    public WorkerSettings withJvmArguments(List<String> arguments) {
        return new WorkerSettings(projectDirectory, classpath, workDirectory, workers, mutantsPerWorker, maxHeap,
                exitOnOutOfMemory, arguments, javaExecutable, startTimeout, baselineTimeout);
    }

    public WorkerSettings withJavaExecutable(Path java) {
        return new WorkerSettings(projectDirectory, classpath, workDirectory, workers, mutantsPerWorker, maxHeap,
                exitOnOutOfMemory, jvmArguments, java, startTimeout, baselineTimeout);
    }

    public WorkerSettings withStartTimeout(Duration timeout) {
        return new WorkerSettings(projectDirectory, classpath, workDirectory, workers, mutantsPerWorker, maxHeap,
                exitOnOutOfMemory, jvmArguments, javaExecutable, timeout, baselineTimeout);
    }

    public WorkerSettings withBaselineTimeout(Duration timeout) {
        return new WorkerSettings(projectDirectory, classpath, workDirectory, workers, mutantsPerWorker, maxHeap,
                exitOnOutOfMemory, jvmArguments, javaExecutable, startTimeout, timeout);
    }
}
