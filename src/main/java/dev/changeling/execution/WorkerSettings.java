package dev.changeling.execution;

import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * How worker JVMs are started: what the tests see (working directory, heap, options, system properties,
 * environment: as the project's build gives its test JVM) and how the pool runs them. Made with a
 * {@link Builder}, which checks every value.
 *
 * @param workingDirectory the working directory of every worker (tests open files relative to it)
 * @param classpath        the project's test classpath in order, schema classes ahead of the project's own
 * @param workDirectory    where the workers' logs, temp folders and the worker classes go (below the build directory)
 * @param workers          worker JVMs running at once
 * @param mutantsPerWorker a worker is replaced after this many mutants, so leaked threads and static state do not pile up
 * @param maxHeap          the {@code -Xmx} value, e.g. {@code 2g}, so results do not depend on the machine's memory
 * @param jvmArguments     the project's options for its test JVM, after ours
 * @param systemProperties system properties the project's build sets in its test JVM
 * @param environment      environment variables the project's build adds for its test JVM
 * @param javaExecutable   the {@code java} that starts the workers
 * @param startTimeout     how long starting a worker and preparing it may take
 * @param baselineTimeout  how long the unmutated suite may take
 */
public record WorkerSettings(Path workingDirectory, List<Path> classpath, Path workDirectory, int workers,
                             int mutantsPerWorker, String maxHeap, List<String> jvmArguments,
                             Map<String, String> systemProperties, Map<String, String> environment, Path javaExecutable,
                             Duration startTimeout, Duration baselineTimeout) {

    public static final String DEFAULT_MAX_HEAP = "2g";
    /**
     * Options every worker starts with, ahead of the project's own (which may override them): the client
     * compiler only, as unit tests are short and each mutant's switch deoptimises code that the optimising
     * compiler would spend far longer recompiling than the tests run. It changes no test's outcome. The garbage
     * collector stays the JVM's default, the one the build's test JVM gets: another collector lays out the heap
     * differently, and a test that allocates one large array passes under one and runs out of memory under the other.
     */
    public static final List<String> TUNING = List.of("-XX:TieredStopAtLevel=1");
    /**
     * A fresh worker costs 0.5–2 s (start, class initialisation, a cold JIT) against a few milliseconds
     * per mutant in a warm one, so replacing it often is dear; after 500 mutants that is a few percent,
     * and memory a leaky suite piles up per run, or threads it leaves behind, stay bounded.
     */
    public static final int DEFAULT_MUTANTS_PER_WORKER = 500;

    public WorkerSettings {
        if (workers < 1) {
            throw new IllegalArgumentException("at least one worker is needed, not " + workers);
        }
        if (mutantsPerWorker < 1) {
            throw new IllegalArgumentException("a worker must run at least one mutant before it is replaced, not " + mutantsPerWorker);
        }
        if (!isHeapSize(maxHeap)) {
            throw new IllegalArgumentException("the worker heap must be a size such as 512m or 2g, not '" + maxHeap + "'");
        }
        workingDirectory = workingDirectory.toAbsolutePath().normalize();
        classpath = List.copyOf(classpath);
        workDirectory = workDirectory.toAbsolutePath().normalize();
        jvmArguments = List.copyOf(jvmArguments);
        systemProperties = Map.copyOf(systemProperties);
        environment = Map.copyOf(environment);
        Objects.requireNonNull(javaExecutable, "javaExecutable");
        Objects.requireNonNull(startTimeout, "startTimeout");
        Objects.requireNonNull(baselineTimeout, "baselineTimeout");
    }

    /**
     * Settings starting from one worker per core, a 2 GiB heap each, the tool's own {@code java}, and no options,
     * properties or environment of the project's.
     */
    public static Builder builder(Path workingDirectory, List<Path> classpath, Path workDirectory) {
        return new Builder(workingDirectory, classpath, workDirectory);
    }

    /** A builder holding these settings, to change some of them. */
    public Builder toBuilder() {
        Builder builder = new Builder(workingDirectory, classpath, workDirectory);
        builder.workers = workers;
        builder.mutantsPerWorker = mutantsPerWorker;
        builder.maxHeap = maxHeap;
        builder.jvmArguments = jvmArguments;
        builder.systemProperties = systemProperties;
        builder.environment = environment;
        builder.javaExecutable = javaExecutable;
        builder.startTimeout = startTimeout;
        builder.baselineTimeout = baselineTimeout;
        return builder;
    }

    /** Whether a text is a heap size as {@code -Xmx} takes it: digits, then k, m, g or t (either case) or nothing. */
    public static boolean isHeapSize(String text) {
        return text.matches("[0-9]+[kKmMgGtT]?");
    }

    public static Path currentJava() {
        boolean windows = System.getProperty("os.name", "").toLowerCase(java.util.Locale.ROOT).startsWith("windows");
        return Path.of(System.getProperty("java.home"), "bin", windows ? "java.exe" : "java");
    }

    /** Collects the settings; {@link #build()} checks them. */
    public static final class Builder {
        private final Path workingDirectory;
        private final List<Path> classpath;
        private final Path workDirectory;
        private int workers = Runtime.getRuntime().availableProcessors();
        private int mutantsPerWorker = DEFAULT_MUTANTS_PER_WORKER;
        private String maxHeap = DEFAULT_MAX_HEAP;
        private List<String> jvmArguments = List.of();
        private Map<String, String> systemProperties = Map.of();
        private Map<String, String> environment = Map.of();
        private Path javaExecutable = currentJava();
        private Duration startTimeout = Duration.ofMinutes(2);
        private Duration baselineTimeout = Duration.ofHours(1);

        private Builder(Path workingDirectory, List<Path> classpath, Path workDirectory) {
            this.workingDirectory = workingDirectory;
            this.classpath = classpath;
            this.workDirectory = workDirectory;
        }

        public Builder workers(int count) {
            this.workers = count;
            return this;
        }

        public Builder mutantsPerWorker(int count) {
            this.mutantsPerWorker = count;
            return this;
        }

        public Builder maxHeap(String size) {
            this.maxHeap = size;
            return this;
        }

        public Builder jvmArguments(List<String> arguments) {
            this.jvmArguments = arguments;
            return this;
        }

        public Builder systemProperties(Map<String, String> properties) {
            this.systemProperties = properties;
            return this;
        }

        public Builder environment(Map<String, String> variables) {
            this.environment = variables;
            return this;
        }

        public Builder javaExecutable(Path java) {
            this.javaExecutable = java;
            return this;
        }

        public Builder startTimeout(Duration timeout) {
            this.startTimeout = timeout;
            return this;
        }

        public Builder baselineTimeout(Duration timeout) {
            this.baselineTimeout = timeout;
            return this;
        }

        /** @throws IllegalArgumentException when a count is below one or the heap is no size */
        public WorkerSettings build() {
            return new WorkerSettings(workingDirectory, classpath, workDirectory, workers, mutantsPerWorker, maxHeap,
                    jvmArguments, systemProperties, environment, javaExecutable, startTimeout, baselineTimeout);
        }
    }
}
