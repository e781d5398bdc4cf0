package dev.changeling.results;

/** One test of the unmutated suite: its JUnit unique id, a readable name and its baseline time. */
public record TestRecord(String id, String name, double millis) {
}
