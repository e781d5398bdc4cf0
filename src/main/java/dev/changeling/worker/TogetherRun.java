package dev.changeling.worker;

import dev.changeling.probe.Probe;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.platform.engine.TestExecutionResult;
import org.junit.platform.launcher.TestIdentifier;

/**
 * Watches one request that runs several selected tests together: each target's own outcome and time,
 * and a failing container (class setup, say) counting as a failure of the targets inside it.
 */
final class TogetherRun implements RequestWatch {

    private final List<String> targets;
    private final Map<String, SingleTestRun.Result> results = new HashMap<>();
    private final Map<String, Long> started = new HashMap<>();
    private final Map<String, Integer> stopsAtStart = new HashMap<>();
    private final Map<String, String> failedContainers = new HashMap<>();

    TogetherRun(List<String> targets) {
        this.targets = List.copyOf(targets);
    }

    @Override
    public void executionStarted(TestIdentifier identifier) {
        started.put(identifier.getUniqueId(), System.nanoTime());
        stopsAtStart.put(identifier.getUniqueId(), Probe.stopsThrown());
    }

    @Override
    public void executionSkipped(TestIdentifier identifier, String reason) {
        for (String target : targets) {
            if (UniqueIds.isWithin(target, identifier.getUniqueId())) {
                results.putIfAbsent(target, new SingleTestRun.Result(Wire.SKIPPED, 0, reason));
            }
        }
    }

    @Override
    public void executionFinished(TestIdentifier identifier, TestExecutionResult result) {
        String id = identifier.getUniqueId();
        long nanos = System.nanoTime() - started.getOrDefault(id, System.nanoTime());
        String message = result.getThrowable().map(Failures::describe).orElse(null);
        if (targets.contains(id)) {
            byte status = switch (result.getStatus()) {
                case SUCCESSFUL -> Wire.PASSED;
                case ABORTED -> Wire.ABORTED;
                case FAILED -> Wire.FAILED;
            };
            results.put(id, new SingleTestRun.Result(status, nanos, message, byStop(id)));
        } else if (result.getStatus() == TestExecutionResult.Status.FAILED) {
            failedContainers.put(id, message == null ? "failed" : message);
        }
    }

    /** The targets that started and did not finish failed by the error; those not started are missing. */
    @Override
    public void unwound(Throwable error) {
        long now = System.nanoTime();
        for (String target : targets) {
            if (started.containsKey(target) && !results.containsKey(target)) {
                results.put(target, new SingleTestRun.Result(Wire.FAILED, now - started.get(target), Failures.describe(error),
                        byStop(target)));
            }
        }
    }

    /** Whether a switch threw to stop the step while this started test ran. */
    private boolean byStop(String id) {
        return Probe.stopsThrown() != stopsAtStart.getOrDefault(id, Probe.stopsThrown());
    }

    /** The outcome of each target, in the order given; a target inside a failed container failed with it. */
    List<SingleTestRun.Result> results() {
        return targets.stream().map(this::resultOf).toList();
    }

    private SingleTestRun.Result resultOf(String target) {
        for (Map.Entry<String, String> container : failedContainers.entrySet()) {
            if (UniqueIds.isWithin(target, container.getKey())) {
                return new SingleTestRun.Result(Wire.FAILED, results.containsKey(target) ? results.get(target).nanos() : 0,
                        container.getValue());
            }
        }
        return results.getOrDefault(target, new SingleTestRun.Result(Wire.MISSING, 0, null));
    }
}
