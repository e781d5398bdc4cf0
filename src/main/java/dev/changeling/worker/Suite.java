package dev.changeling.worker;

import static org.junit.platform.engine.discovery.DiscoverySelectors.selectClasspathRoots;
import static org.junit.platform.engine.discovery.DiscoverySelectors.selectUniqueId;

import dev.changeling.probe.Probe;
import java.io.DataOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.logging.Level;
import java.util.logging.Logger;
import org.junit.platform.engine.discovery.ClassNameFilter;
import org.junit.platform.launcher.Launcher;
import org.junit.platform.launcher.LauncherDiscoveryRequest;
import org.junit.platform.launcher.TagFilter;
import org.junit.platform.launcher.TestIdentifier;
import org.junit.platform.launcher.TestPlan;
import org.junit.platform.launcher.core.LauncherDiscoveryRequestBuilder;
import org.junit.platform.launcher.core.LauncherFactory;

/** The project's test suite as this worker sees it: which tests the baseline finds, and running one of them. */
final class Suite {

    /**
     * Discovery notices (an engine's deprecation, say) are logged once in the baseline; repeated for every
     * single test run they would fill the worker's log. Held here, as the logging system keeps loggers weakly.
     */
    private static final Logger LAUNCHER_LOG = Logger.getLogger("org.junit.platform.launcher.core");

    /** Reach is attributed to whichever test is running, so tests must run one after another. */
    private static final String PARALLEL = "junit.jupiter.execution.parallel.enabled";

    private final Set<Path> testRoots = new LinkedHashSet<>();
    private final List<String> includes;
    private final List<String> excludes;
    private final List<String> excludedTags;
    private Launcher launcher;

    Suite(List<String> testRoots, List<String> includes, List<String> excludes, List<String> excludedTags) {
        testRoots.forEach(root -> this.testRoots.add(Path.of(root)));
        this.includes = List.copyOf(includes);
        this.excludes = List.copyOf(excludes);
        this.excludedTags = List.copyOf(excludedTags);
    }

    void baseline(DataOutputStream out) throws IOException {
        LauncherDiscoveryRequestBuilder request = LauncherDiscoveryRequestBuilder.request()
                .selectors(selectClasspathRoots(testRoots))
                .configurationParameter(PARALLEL, "false");
        if (!includes.isEmpty()) {
            request.filters(ClassNameFilter.includeClassNamePatterns(includes.toArray(String[]::new)));
        }
        if (!excludes.isEmpty()) {
            request.filters(ClassNameFilter.excludeClassNamePatterns(excludes.toArray(String[]::new)));
        }
        if (!excludedTags.isEmpty()) {
            request.filters(TagFilter.excludeTags(excludedTags));
        }
        BaselineRecorder recorder = new BaselineRecorder(name -> progress(out, name));
        Probe.drainReached();
        Probe.record(true);
        try {
            launcher().execute(request.build(), recorder);
        } finally {
            Probe.record(false);
        }
        recorder.write(out);
    }

    SingleTestRun.Result runOne(String uniqueId) {
        LAUNCHER_LOG.setLevel(Level.WARNING);
        LauncherDiscoveryRequest request = LauncherDiscoveryRequestBuilder.request()
                .selectors(selectUniqueId(uniqueId))
                .configurationParameter(PARALLEL, "false")
                .build();
        SingleTestRun listener = new SingleTestRun(uniqueId);
        long start = System.nanoTime();
        TestPlan plan;
        try {
            plan = launcher().discover(request);
        } catch (RuntimeException notFound) {
            // Newer platforms refuse a selector that selects nothing; older ones return an empty plan.
            return new SingleTestRun.Result(Wire.MISSING, System.nanoTime() - start, Failures.describe(notFound));
        }
        if (mayHold(plan, uniqueId)) {
            launcher().execute(plan, listener);
        }
        long nanos = System.nanoTime() - start;
        Thread.interrupted();
        Thread.currentThread().setContextClassLoader(ClassLoader.getSystemClassLoader());
        return listener.result(nanos);
    }

    /**
     * Runs several tests in one request, which pays for discovery once instead of once per test; their
     * outcomes come back in the order given. If the request cannot be discovered (an id that no longer
     * selects anything), every test runs on its own instead, so that a missing test never looks like a kill.
     */
    List<SingleTestRun.Result> runTogether(List<String> uniqueIds) {
        LAUNCHER_LOG.setLevel(Level.WARNING);
        LauncherDiscoveryRequest request = LauncherDiscoveryRequestBuilder.request()
                .selectors(uniqueIds.stream().map(id -> selectUniqueId(id)).toList())
                .configurationParameter(PARALLEL, "false")
                .build();
        TestPlan plan;
        try {
            plan = launcher().discover(request);
        } catch (RuntimeException notFound) {
            return uniqueIds.stream().map(this::runOne).toList();
        }
        if (uniqueIds.stream().anyMatch(id -> plan.countTestIdentifiers(node -> id.equals(node.getUniqueId())) == 0)) {
            return uniqueIds.stream().map(this::runOne).toList();
        }
        TogetherRun listener = new TogetherRun(uniqueIds);
        launcher().execute(plan, listener);
        Thread.interrupted();
        Thread.currentThread().setContextClassLoader(ClassLoader.getSystemClassLoader());
        return listener.results();
    }

    /**
     * Whether the plan has the test, or has no test at all but a container below the engine that may yet
     * register it (parameterised and dynamic tests appear only while they run). An id that selects
     * nothing is not run: engines report that as a failure of their own (a stand-in test, a failed
     * engine), which must not count as a kill.
     */
    private static boolean mayHold(TestPlan plan, String uniqueId) {
        if (plan.countTestIdentifiers(node -> uniqueId.equals(node.getUniqueId())) > 0) {
            return true;
        }
        return plan.countTestIdentifiers(TestIdentifier::isTest) == 0
                && plan.countTestIdentifiers(node -> node.getParentId().isPresent() && uniqueId.startsWith(node.getUniqueId() + "/")) > 0;
    }

    /**
     * Loads the engines and runs an empty request, so that a fresh worker's first mutant does not pay for
     * that inside its deadline.
     */
    void warmUp() {
        TestPlan empty = launcher().discover(LauncherDiscoveryRequestBuilder.request().configurationParameter(PARALLEL, "false").build());
        launcher().execute(empty);
    }

    private Launcher launcher() {
        if (launcher == null) {
            launcher = LauncherFactory.create();
        }
        return launcher;
    }

    private static void progress(DataOutputStream out, String name) {
        try {
            synchronized (out) {
                out.writeByte(Wire.PROGRESS);
                Wire.writeString(out, name);
                out.flush();
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
