package dev.changeling.worker;

import dev.changeling.probe.Probe;
import java.io.DataOutputStream;
import java.io.IOException;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.Deque;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Consumer;
import org.junit.platform.engine.TestExecutionResult;
import org.junit.platform.engine.TestSource;
import org.junit.platform.engine.support.descriptor.ClassSource;
import org.junit.platform.engine.support.descriptor.MethodSource;
import org.junit.platform.launcher.TestExecutionListener;
import org.junit.platform.launcher.TestIdentifier;
import org.junit.platform.launcher.TestPlan;

/**
 * Records the unmutated suite: each test's result and time (alone, and with what its containers cost
 * on their own), and the mutation points it reached. Points
 * reached while a container runs (class setup, {@code @BeforeAll}) count for every test inside it, and
 * points reached outside any test or container count for all tests.
 */
final class BaselineRecorder implements TestExecutionListener {

    private record Finished(TestIdentifier identifier, byte status, long nanos, String message) {
    }

    private record FailedContainer(String id, String name, String message) {
    }

    private final Consumer<String> progress;
    private final Deque<String> running = new ArrayDeque<>();
    private final Map<String, List<int[]>> reachedByNode = new HashMap<>();
    private final List<int[]> reachedOutside = new ArrayList<>();
    private final Map<String, Long> startedAt = new HashMap<>();
    private final Map<String, Long> durations = new HashMap<>();
    private final Map<String, Long> childrenDurations = new HashMap<>();
    private final Map<String, Finished> tests = new LinkedHashMap<>();
    private final List<FailedContainer> failedContainers = new ArrayList<>();
    private TestPlan plan;

    BaselineRecorder(Consumer<String> progress) {
        this.progress = progress;
    }

    @Override
    public void testPlanExecutionStarted(TestPlan testPlan) {
        plan = testPlan;
        attributeReach();
    }

    @Override
    public void testPlanExecutionFinished(TestPlan testPlan) {
        attributeReach();
    }

    @Override
    public void executionStarted(TestIdentifier identifier) {
        attributeReach();
        running.push(identifier.getUniqueId());
        startedAt.put(identifier.getUniqueId(), System.nanoTime());
    }

    @Override
    public void executionSkipped(TestIdentifier identifier, String reason) {
        attributeReach();
        if (identifier.isTest()) {
            skipped(identifier, reason);
        }
        for (TestIdentifier inside : plan.getDescendants(identifier)) {
            if (inside.isTest()) {
                skipped(inside, reason);
            }
        }
    }

    @Override
    public void executionFinished(TestIdentifier identifier, TestExecutionResult result) {
        attributeReach();
        String id = identifier.getUniqueId();
        running.remove(id);
        long nanos = System.nanoTime() - startedAt.getOrDefault(id, System.nanoTime());
        durations.put(id, nanos);
        identifier.getParentId().ifPresent(parent -> childrenDurations.merge(parent, nanos, Long::sum));
        String message = result.getThrowable().map(Failures::describe).orElse(null);
        if (identifier.isTest()) {
            tests.put(id, new Finished(identifier, status(result), nanos, message));
            progress.accept(name(identifier));
        } else if (result.getStatus() == TestExecutionResult.Status.FAILED) {
            failedContainers.add(new FailedContainer(id, name(identifier), message == null ? "failed" : message));
        }
    }

    /** The BASELINE_DONE message, which ends with the excluded tag expressions that left out a test. */
    void write(DataOutputStream out, List<String> tagsThatLeftSomethingOut) throws IOException {
        out.writeByte(Wire.BASELINE_DONE);
        out.writeInt(tests.size());
        BitSet union = new BitSet();
        for (Finished test : tests.values()) {
            Wire.writeString(out, test.identifier().getUniqueId());
            Wire.writeString(out, name(test.identifier()));
            Wire.writeString(out, className(test.identifier()));
            out.writeByte(test.status());
            out.writeLong(test.nanos());
            out.writeLong(test.nanos() + containerOverhead(test.identifier()));
            Wire.writeString(out, test.message());
            union.clear();
            reachOf(test.identifier(), union);
            Wire.writeInts(out, union.stream().toArray());
        }
        out.writeInt(failedContainers.size());
        for (FailedContainer container : failedContainers) {
            Wire.writeString(out, container.id());
            Wire.writeString(out, container.name());
            Wire.writeString(out, container.message());
        }
        Wire.writeStrings(out, tagsThatLeftSomethingOut);
    }

    private void skipped(TestIdentifier identifier, String reason) {
        if (!tests.containsKey(identifier.getUniqueId())) {
            tests.put(identifier.getUniqueId(), new Finished(identifier, Wire.SKIPPED, 0, reason));
        }
    }

    private void attributeReach() {
        int[] reached = Probe.drainReached();
        if (reached.length == 0) {
            return;
        }
        if (running.isEmpty()) {
            reachedOutside.add(reached);
        } else {
            reachedByNode.computeIfAbsent(running.peek(), id -> new ArrayList<>()).add(reached);
        }
    }

    private void reachOf(TestIdentifier test, BitSet union) {
        for (int[] chunk : reachedOutside) {
            add(chunk, union);
        }
        Optional<TestIdentifier> node = Optional.of(test);
        while (node.isPresent()) {
            for (int[] chunk : reachedByNode.getOrDefault(node.get().getUniqueId(), List.of())) {
                add(chunk, union);
            }
            node = plan.getParent(node.get());
        }
    }

    /**
     * The time the test's containers spend on their own (class setup and teardown), which running the
     * test alone pays again in full. The engine's own time is left out: a worker pays it once, when it
     * is prepared, and in a large suite it adds up to seconds that would inflate every deadline.
     */
    private long containerOverhead(TestIdentifier test) {
        long overhead = 0;
        Optional<TestIdentifier> container = plan.getParent(test);
        while (container.isPresent() && plan.getParent(container.get()).isPresent()) {
            String id = container.get().getUniqueId();
            overhead += Math.max(0, durations.getOrDefault(id, 0L) - childrenDurations.getOrDefault(id, 0L));
            container = plan.getParent(container.get());
        }
        return overhead;
    }

    private static void add(int[] chunk, BitSet union) {
        for (int id : chunk) {
            union.set(id);
        }
    }

    /** The display names from the class down, e.g. {@code PriceTest > rounds half up}; the engine is left out. */
    private String name(TestIdentifier identifier) {
        Deque<String> parts = new ArrayDeque<>();
        Optional<TestIdentifier> node = Optional.of(identifier);
        while (node.isPresent()) {
            Optional<TestIdentifier> parent = plan.getParent(node.get());
            if (parent.isPresent()) {
                parts.push(node.get().getDisplayName());
            }
            node = parent;
        }
        return String.join(" > ", parts);
    }

    private String className(TestIdentifier identifier) {
        Optional<TestIdentifier> node = Optional.of(identifier);
        while (node.isPresent()) {
            Optional<TestSource> source = node.get().getSource();
            if (source.isPresent() && source.get() instanceof MethodSource method) {
                return method.getClassName();
            }
            if (source.isPresent() && source.get() instanceof ClassSource type) {
                return type.getClassName();
            }
            node = plan.getParent(node.get());
        }
        return null;
    }

    private static byte status(TestExecutionResult result) {
        return switch (result.getStatus()) {
            case SUCCESSFUL -> Wire.PASSED;
            case ABORTED -> Wire.ABORTED;
            case FAILED -> Wire.FAILED;
        };
    }
}
