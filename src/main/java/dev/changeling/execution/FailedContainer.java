package dev.changeling.execution;

/** A class or other container whose own setup or teardown failed in the baseline. */
public record FailedContainer(String id, String name, String message) {
}
