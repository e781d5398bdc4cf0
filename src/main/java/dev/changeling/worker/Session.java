package dev.changeling.worker;

import dev.changeling.probe.Probe;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.EOFException;
import java.io.IOException;
import java.util.List;

/** Reads commands from the tool one at a time and answers each; a failing command is reported, not fatal. */
final class Session {

    private final DataInputStream in;
    private final DataOutputStream out;
    private Suite suite;

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
                return;
            }
            try {
                switch (command) {
                    case Wire.PREPARE -> prepare();
                    case Wire.BASELINE -> requireSuite().baseline(out);
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
        List<String> preinitialise = Wire.readStrings(in);
        List<String> testRoots = Wire.readStrings(in);
        List<String> includes = Wire.readStrings(in);
        List<String> excludes = Wire.readStrings(in);
        List<String> excludedTags = Wire.readStrings(in);
        suite = new Suite(testRoots, includes, excludes, excludedTags);
        suite.warmUp();
        Probe.prepare(points);
        Probe.record(true);
        List<String> failures = ClassWarmer.initialise(preinitialise);
        Probe.record(false);
        int[] reached = Probe.drainReached();
        out.writeByte(Wire.PREPARED);
        Wire.writeInts(out, reached);
        Wire.writeStrings(out, failures);
    }

    private void run() throws IOException {
        int[] points = Wire.readInts(in);
        List<String> tests = Wire.readStrings(in);
        Suite current = requireSuite();
        Probe.activate(points);
        try {
            for (String test : tests) {
                SingleTestRun.Result result = current.runOne(test);
                out.writeByte(Wire.TEST_DONE);
                Wire.writeString(out, test);
                out.writeByte(result.status());
                out.writeLong(result.nanos());
                Wire.writeString(out, result.message());
                out.flush();
                if (result.status() == Wire.FAILED) {
                    break;
                }
            }
        } finally {
            Probe.activate();
        }
        out.writeByte(Wire.RUN_DONE);
    }

    private Suite requireSuite() {
        if (suite == null) {
            throw new IllegalStateException("the worker was not prepared");
        }
        return suite;
    }
}
