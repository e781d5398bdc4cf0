package dev.changeling.worker;

import dev.changeling.probe.Probe;
import org.junit.platform.engine.TestExecutionResult;
import org.junit.platform.launcher.TestIdentifier;

/**
 * Watches the run of one selected test: any failure in it or in its containers (a broken assertion or
 * any other error, in setup or teardown too) makes it failed.
 */
final class SingleTestRun implements RequestWatch {

    /**
     * How the one test ended; {@code message} says why it failed, was aborted or skipped; {@code byStop} whether a
     * switch threw to stop the step while it ran, so that its end may be the stop's doing rather than its own.
     */
    record Result(byte status, long nanos, String message, boolean byStop) {

        Result(byte status, long nanos, String message) {
            this(status, nanos, message, false);
        }
    }

    private final String target;
    private final int stopsBefore = Probe.stopsThrown();
    private byte status = Wire.MISSING;
    private String message;
    private String failure;

    SingleTestRun(String target) {
        this.target = target;
    }

    @Override
    public void executionSkipped(TestIdentifier identifier, String reason) {
        if (UniqueIds.isWithin(target, identifier.getUniqueId())) {
            status = Wire.SKIPPED;
            message = reason;
        }
    }

    @Override
    public void executionFinished(TestIdentifier identifier, TestExecutionResult result) {
        TestExecutionResult.Status outcome = result.getStatus();
        if (outcome == TestExecutionResult.Status.FAILED && failure == null) {
            failure = result.getThrowable().map(Failures::describe).orElse("failed");
        }
        if (identifier.getUniqueId().equals(target)) {
            status = outcome == TestExecutionResult.Status.SUCCESSFUL ? Wire.PASSED
                    : outcome == TestExecutionResult.Status.ABORTED ? Wire.ABORTED : Wire.FAILED;
            message = result.getThrowable().map(Failures::describe).orElse(null);
        } else if (outcome == TestExecutionResult.Status.ABORTED && UniqueIds.isWithin(target, identifier.getUniqueId()) && status == Wire.MISSING) {
            status = Wire.ABORTED;
            message = result.getThrowable().map(Failures::describe).orElse(null);
        }
    }

    @Override
    public void unwound(Throwable error) {
        if (failure == null) {
            failure = Failures.describe(error);
        }
    }

    Result result(long nanos) {
        boolean byStop = Probe.stopsThrown() != stopsBefore;
        return failure != null ? new Result(Wire.FAILED, nanos, failure, byStop) : new Result(status, nanos, message, byStop);
    }
}
