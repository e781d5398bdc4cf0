package dev.changeling.worker;

import static org.junit.platform.engine.discovery.DiscoverySelectors.selectClass;
import static org.junit.platform.engine.discovery.DiscoverySelectors.selectUniqueId;

import dev.changeling.probe.Probe;
import java.io.DataOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.List;
import java.util.Map;
import java.util.logging.Level;
import java.util.logging.Logger;
import org.junit.platform.engine.ConfigurationParameters;
import org.junit.platform.launcher.Launcher;
import org.junit.platform.launcher.LauncherDiscoveryRequest;
import org.junit.platform.launcher.LauncherSession;
import org.junit.platform.launcher.TagFilter;
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

    private final List<String> includedTags;
    private final List<String> excludedTags;
    private final Map<String, String> configurationParameters;
    private LauncherSession session;
    private ConfigurationParameters implicitParameters;

    /**
     * @param includedTags            tag expressions a test must match, none for every test
     * @param excludedTags            tag expressions whose tests are left out
     * @param configurationParameters the build's JUnit Platform parameters, for every request
     */
    Suite(List<String> includedTags, List<String> excludedTags, Map<String, String> configurationParameters) {
        this.includedTags = List.copyOf(includedTags);
        this.excludedTags = List.copyOf(excludedTags);
        this.configurationParameters = Map.copyOf(configurationParameters);
    }

    /**
     * Runs the tests of these classes, as the build selects them: the classes, then the tags; the reply also
     * names the excluded tags that left out a test.
     */
    void baseline(List<String> testClasses, DataOutputStream out) throws IOException {
        LauncherDiscoveryRequestBuilder request = LauncherDiscoveryRequestBuilder.request()
                .selectors(testClasses.stream().map(name -> selectClass(name)).toList())
                .configurationParameters(configurationParameters)
                .configurationParameter(PARALLEL, "false");
        if (!includedTags.isEmpty()) {
            request.filters(TagFilter.includeTags(includedTags));
        }
        TagExclusions exclusions = new TagExclusions(excludedTags);
        if (!exclusions.isEmpty()) {
            request.filters(exclusions);
        }
        BaselineRecorder recorder = new BaselineRecorder(name -> progress(out, name));
        Probe.drainReached();
        Probe.record(true);
        try {
            launcher().execute(request.build(), recorder);
        } finally {
            Probe.record(false);
        }
        recorder.write(out, exclusions.thatLeftSomethingOut());
    }

    SingleTestRun.Result runOne(String uniqueId) {
        LAUNCHER_LOG.setLevel(Level.WARNING);
        LauncherDiscoveryRequest request = request(List.of(uniqueId));
        SingleTestRun listener = new SingleTestRun(uniqueId);
        long start = System.nanoTime();
        TestPlan plan;
        try {
            plan = launcher().discover(request);
        } catch (RuntimeException notFound) {
            // Newer platforms refuse a selector that selects nothing; older ones return an empty plan.
            return new SingleTestRun.Result(Wire.MISSING, System.nanoTime() - start, Failures.describe(notFound));
        }
        if (PlannedIds.of(plan).mayHold(uniqueId)) {
            execute(plan, listener);
        }
        return listener.result(System.nanoTime() - start);
    }

    /**
     * Runs several tests in one request, which pays for discovery once instead of once per test; their
     * outcomes come back in the order given. If the request cannot be discovered, or the plan cannot hold one
     * of the ids ({@link PlannedIds}: an id that no longer selects anything), every test runs on its own
     * instead, so that a missing test never looks like a kill.
     */
    List<SingleTestRun.Result> runTogether(List<String> uniqueIds) {
        LAUNCHER_LOG.setLevel(Level.WARNING);
        LauncherDiscoveryRequest request = request(uniqueIds);
        TestPlan plan;
        try {
            plan = launcher().discover(request);
        } catch (RuntimeException notFound) {
            plan = null;
        }
        if (plan == null || !uniqueIds.stream().allMatch(PlannedIds.of(plan)::mayHold)) {
            return uniqueIds.stream().map(this::runOne).toList();
        }
        TogetherRun listener = new TogetherRun(uniqueIds);
        execute(plan, listener);
        return listener.results();
    }

    /**
     * Runs a plan, then clears what its tests may have left on this thread: an interrupt, a context class loader.
     * A mutant that exhausts the heap fails its test like any error; the tool replaces the worker afterwards.
     */
    private void execute(TestPlan plan, RequestWatch listener) {
        try {
            launcher().execute(plan, listener);
        } catch (OutOfMemoryError error) {
            listener.unwound(error);
        }
        Thread.interrupted();
        Thread.currentThread().setContextClassLoader(ClassLoader.getSystemClassLoader());
    }

    /**
     * A request for these tests. The configuration parameters the platform reads from the system properties
     * and the classpath's {@code junit-platform.properties} are read for the first request only and handed
     * to every later one, as reading that file again was an eighth of a killed mutant's time.
     */
    private LauncherDiscoveryRequest request(List<String> uniqueIds) {
        LauncherDiscoveryRequestBuilder builder = LauncherDiscoveryRequestBuilder.request()
                .selectors(uniqueIds.stream().map(id -> selectUniqueId(id)).toList())
                .configurationParameters(configurationParameters)
                .configurationParameter(PARALLEL, "false");
        if (implicitParameters != null) {
            builder.parentConfigurationParameters(implicitParameters).enableImplicitConfigurationParameters(false);
        }
        LauncherDiscoveryRequest request = builder.build();
        if (implicitParameters == null) {
            implicitParameters = request.getConfigurationParameters();
        }
        return request;
    }

    /**
     * Loads the engines and runs an empty request, so that a fresh worker's first mutant does not pay for
     * that inside its deadline.
     */
    void warmUp() {
        TestPlan empty = launcher().discover(LauncherDiscoveryRequestBuilder.request()
                .configurationParameters(configurationParameters).configurationParameter(PARALLEL, "false").build());
        launcher().execute(empty);
    }

    /**
     * The launcher of one session that lasts as long as the worker. A launcher made without a session opens
     * a new one for every request, looking up its listeners on the classpath each time: that lookup was
     * two fifths of a killed mutant's time. Build tools run a suite in one session, so tests see the same.
     */
    private Launcher launcher() {
        if (session == null) {
            session = LauncherFactory.openSession();
        }
        return session.getLauncher();
    }

    /** Ends the session, which tells the project's session listeners, if it has any. */
    void close() {
        if (session != null) {
            session.close();
            session = null;
        }
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
