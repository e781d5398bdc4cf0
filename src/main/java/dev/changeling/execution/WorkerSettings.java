package dev.changeling.execution;

import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * How worker JVMs are started: what the tests see (working directory, heap, options, system properties,
 * environment: as the project's build gives its test JVM) and how the pool runs them. Immutable; each
 * {@code with…} returns a changed copy.
 */
public final class WorkerSettings {

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

    private Path workingDirectory;
    private List<Path> classpath;
    private Path workDirectory;
    private int workers;
    private int mutantsPerWorker;
    private String maxHeap;
    private List<String> jvmArguments;
    private Map<String, String> systemProperties;
    private Map<String, String> environment;
    private Path javaExecutable;
    private Duration startTimeout;
    private Duration baselineTimeout;

    private WorkerSettings() {
    }

    /**
     * One worker per core, 2 GiB heap each, the tool's own {@code java}, no options or properties of the project's.
     *
     * @param workingDirectory the working directory of every worker (tests open files relative to it)
     * @param classpath        the project's test classpath in order, schema classes ahead of the project's own
     * @param workDirectory    where the workers' logs, temp folders and the worker classes go (below the build directory)
     */
    public static WorkerSettings of(Path workingDirectory, List<Path> classpath, Path workDirectory) {
        WorkerSettings settings = new WorkerSettings();
        settings.workingDirectory = workingDirectory.toAbsolutePath().normalize();
        settings.classpath = List.copyOf(classpath);
        settings.workDirectory = workDirectory.toAbsolutePath().normalize();
        settings.workers = Runtime.getRuntime().availableProcessors();
        settings.mutantsPerWorker = DEFAULT_MUTANTS_PER_WORKER;
        settings.maxHeap = DEFAULT_MAX_HEAP;
        settings.jvmArguments = List.of();
        settings.systemProperties = Map.of();
        settings.environment = Map.of();
        settings.javaExecutable = currentJava();
        settings.startTimeout = Duration.ofMinutes(2);
        settings.baselineTimeout = Duration.ofHours(1);
        return settings;
    }

    public static Path currentJava() {
        boolean windows = System.getProperty("os.name", "").toLowerCase(java.util.Locale.ROOT).startsWith("windows");
        return Path.of(System.getProperty("java.home"), "bin", windows ? "java.exe" : "java");
    }

    public Path workingDirectory() {
        return workingDirectory;
    }

    public List<Path> classpath() {
        return classpath;
    }

    public Path workDirectory() {
        return workDirectory;
    }

    /** Worker JVMs running at once. */
    public int workers() {
        return workers;
    }

    /** A worker is replaced after this many mutants, so leaked threads and static state do not pile up. */
    public int mutantsPerWorker() {
        return mutantsPerWorker;
    }

    /** The {@code -Xmx} value, e.g. {@code 2g}, so results do not depend on the machine's memory. */
    public String maxHeap() {
        return maxHeap;
    }

    /** The project's options for its test JVM, after ours. */
    public List<String> jvmArguments() {
        return jvmArguments;
    }

    /** System properties the project's build sets in its test JVM. */
    public Map<String, String> systemProperties() {
        return systemProperties;
    }

    /** Environment variables the project's build adds for its test JVM. */
    public Map<String, String> environment() {
        return environment;
    }

    public Path javaExecutable() {
        return javaExecutable;
    }

    /** How long starting a worker and preparing it may take. */
    public Duration startTimeout() {
        return startTimeout;
    }

    /** How long the unmutated suite may take. */
    public Duration baselineTimeout() {
        return baselineTimeout;
    }

    public WorkerSettings withWorkers(int count) {
        if (count < 1) {
            throw new IllegalArgumentException("at least one worker is needed, not " + count);
        }
        WorkerSettings copy = copy();
        copy.workers = count;
        return copy;
    }

    public WorkerSettings withMutantsPerWorker(int count) {
        if (count < 1) {
            throw new IllegalArgumentException("a worker must run at least one mutant before it is replaced, not " + count);
        }
        WorkerSettings copy = copy();
        copy.mutantsPerWorker = count;
        return copy;
    }

    public WorkerSettings withMaxHeap(String size) {
        if (!size.matches("[0-9]+[kKmMgGtT]?")) {
            throw new IllegalArgumentException("the worker heap must be a size such as 512m or 2g, not '" + size + "'");
        }
        WorkerSettings copy = copy();
        copy.maxHeap = size;
        return copy;
    }

    public WorkerSettings withJvmArguments(List<String> arguments) {
        WorkerSettings copy = copy();
        copy.jvmArguments = List.copyOf(arguments);
        return copy;
    }

    public WorkerSettings withSystemProperties(Map<String, String> properties) {
        WorkerSettings copy = copy();
        copy.systemProperties = Map.copyOf(properties);
        return copy;
    }

    public WorkerSettings withEnvironment(Map<String, String> variables) {
        WorkerSettings copy = copy();
        copy.environment = Map.copyOf(variables);
        return copy;
    }

    public WorkerSettings withJavaExecutable(Path java) {
        WorkerSettings copy = copy();
        copy.javaExecutable = Objects.requireNonNull(java, "java");
        return copy;
    }

    public WorkerSettings withStartTimeout(Duration timeout) {
        WorkerSettings copy = copy();
        copy.startTimeout = Objects.requireNonNull(timeout, "timeout");
        return copy;
    }

    public WorkerSettings withBaselineTimeout(Duration timeout) {
        WorkerSettings copy = copy();
        copy.baselineTimeout = Objects.requireNonNull(timeout, "timeout");
        return copy;
    }

    private WorkerSettings copy() {
        WorkerSettings copy = new WorkerSettings();
        copy.workingDirectory = workingDirectory;
        copy.classpath = classpath;
        copy.workDirectory = workDirectory;
        copy.workers = workers;
        copy.mutantsPerWorker = mutantsPerWorker;
        copy.maxHeap = maxHeap;
        copy.jvmArguments = jvmArguments;
        copy.systemProperties = systemProperties;
        copy.environment = environment;
        copy.javaExecutable = javaExecutable;
        copy.startTimeout = startTimeout;
        copy.baselineTimeout = baselineTimeout;
        return copy;
    }
}
