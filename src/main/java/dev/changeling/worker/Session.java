package dev.changeling.worker;

import dev.changeling.probe.Probe;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.EOFException;
import java.io.IOException;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** Reads commands from the tool one at a time and answers each; a failing command is reported, not fatal. */
final class Session {

    private final DataInputStream in;
    private final DataOutputStream out;
    private Suite suite;
    /** The schema methods entered while the production classes were initialised: part of what every mutant ran. */
    private int[] enteredWhilePreparing = new int[0];

    Session(DataInputStream in, DataOutputStream out) {
        this.in = in;
        this.out = out;
    }

    void serve() throws IOException {
        while (true) {
            byte command;
            try {
                command = in.readByte();
            } catch (EOFException toolClosed) {
                return;
            }
            if (command == Wire.QUIT) {
                if (suite != null) {
                    suite.close();
                }
                return;
            }
            try {
                switch (command) {
                    case Wire.PREPARE -> prepare();
                    case Wire.BASELINE -> requireSuite().baseline(Wire.readStrings(in), out);
                    case Wire.RUN -> run();
                    default -> throw new IllegalStateException("unknown command " + command);
                }
            } catch (IOException e) {
                throw e;
            } catch (Throwable e) {
                out.writeByte(Wire.FAILURE);
                Wire.writeString(out, Failures.describe(e));
            }
            out.flush();
            Thread.interrupted();
            Thread.currentThread().setContextClassLoader(ClassLoader.getSystemClassLoader());
        }
    }

    private void prepare() throws IOException {
        int points = in.readInt();
        int methods = in.readInt();
        List<String> preinitialise = Wire.readStrings(in);
        List<String> includedTags = Wire.readStrings(in);
        List<String> excludedTags = Wire.readStrings(in);
        List<String> parameters = Wire.readStrings(in);
        Map<String, String> configurationParameters = new LinkedHashMap<>();
        for (int i = 0; i + 1 < parameters.size(); i += 2) {
            configurationParameters.put(parameters.get(i), parameters.get(i + 1));
        }
        suite = new Suite(includedTags, excludedTags, configurationParameters);
        suite.warmUp();
        Probe.prepare(points, methods);
        Probe.record(true);
        List<String> failures = ClassWarmer.initialise(preinitialise);
        Probe.record(false);
        int[] reached = Probe.drainReached();
        enteredWhilePreparing = Probe.drainEntered();
        out.writeByte(Wire.PREPARED);
        Wire.writeInts(out, reached);
        Wire.writeStrings(out, failures);
    }

    private void run() throws IOException {
        int[] points = Wire.readInts(in);
        List<String> tests = Wire.readStrings(in);
        boolean everyTest = in.readByte() != 0;
        Suite current = requireSuite();
        Probe.drainEntered();
        Probe.activate(points);
        try {
            // Tests run in chunks of doubling size, fastest first: the first alone (the likeliest to kill;
            // most mutants stop there), then 2, 4, 8, ... together in one request each. A kill stops the
            // run after its chunk, unless every test is to run, and a survivor pays for a handful of
            // discoveries, not one per test.
            int at = 0;
            for (int size = 1; at < tests.size(); size *= 2) {
                List<String> chunk = tests.subList(at, Math.min(tests.size(), at + size));
                Probe.beginStep();
                out.writeByte(Wire.STEP);
                out.writeInt(chunk.size());
                out.flush();
                List<SingleTestRun.Result> results = chunk.size() == 1
                        ? List.of(current.runOne(chunk.get(0)))
                        : current.runTogether(chunk);
                if (Probe.stopped()) {
                    reportStopped(chunk, results);
                    break;
                }
                if (!reportChunk(chunk, results, everyTest)) {
                    break;
                }
                at += chunk.size();
            }
        } finally {
            Probe.activate();
        }
        out.writeByte(Wire.RUN_DONE);
        Wire.writeInts(out, entered());
    }

    /** The schema methods this run entered, and those entered while the classes were initialised. */
    private int[] entered() {
        int[] during = Probe.drainEntered();
        int[] all = java.util.Arrays.copyOf(enteredWhilePreparing, enteredWhilePreparing.length + during.length);
        System.arraycopy(during, 0, all, enteredWhilePreparing.length, during.length);
        return all;
    }

    /**
     * Sends the outcomes of a chunk that ran to its end: all of them when every test is to run, else those up to the
     * first failure. False when a test failed and the run stops there.
     */
    private boolean reportChunk(List<String> chunk, List<SingleTestRun.Result> results, boolean everyTest) throws IOException {
        boolean passed = true;
        for (int i = 0; i < chunk.size() && (passed || everyTest); i++) {
            passed &= report(chunk.get(i), results.get(i));
        }
        return passed || everyTest;
    }

    /**
     * The step was stopped at its deadline: the tests that passed before the stop are reported as they ended, and
     * the first that did not pass (the one running when the stop came; the last, if a thread of the test's own
     * was what ran on) as stopped, unless it failed by itself with no switch throwing while it ran: the deadline
     * passed, but its end, a failure like any other (a heap run out after long collecting, say), is its own.
     */
    private void reportStopped(List<String> chunk, List<SingleTestRun.Result> results) throws IOException {
        int stopped = 0;
        while (stopped < chunk.size() - 1 && results.get(stopped).status() == Wire.PASSED) {
            report(chunk.get(stopped), results.get(stopped));
            stopped++;
        }
        SingleTestRun.Result result = results.get(stopped);
        boolean ownFailure = result.status() == Wire.FAILED && !result.byStop();
        report(chunk.get(stopped), ownFailure ? result : new SingleTestRun.Result(Wire.STOPPED, result.nanos(), result.message()));
    }

    /** Sends one test's outcome; false when it failed (or was stopped). */
    private boolean report(String test, SingleTestRun.Result result) throws IOException {
        out.writeByte(Wire.TEST_DONE);
        Wire.writeString(out, test);
        out.writeByte(result.status());
        out.writeLong(result.nanos());
        Wire.writeString(out, result.message());
        out.flush();
        return result.status() != Wire.FAILED && result.status() != Wire.STOPPED;
    }

    private Suite requireSuite() {
        if (suite == null) {
            throw new IllegalStateException("the worker was not prepared");
        }
        return suite;
    }
}
