package dev.changeling.worker;

import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/**
 * The binary protocol between the tool and a worker JVM, shared by both sides: the message codes and
 * how strings and number lists are written. Every message is one code byte followed by its fields.
 *
 * <pre>
 * worker -> tool on connect  HELLO version:int token:str pid:long
 * worker -> tool, 2nd socket TOKEN token:str, then tool -> worker: stepNumber:int whenever a step's deadline passes
 *                            (the worker's switches then throw until that step ends; steps count from 1 per worker),
 *                            or EXIT (-1) when the tool is done with the worker, whatever it runs: the worker exits
 *                            through System.exit, so its shutdown hooks run (deleteOnExit files go) as in a test JVM
 * tool -> worker  PREPARE    points:int methods:int preinitialise:strs includedTags:strs excludedTags:strs parameters:strs (name, value, name, …)
 *                   reply    PREPARED reachedWhileInitialising:ints failures:strs
 * tool -> worker  BASELINE   testClasses:strs
 *                   reply    PROGRESS name:str (once per finished test) ... then
 *                            BASELINE_DONE n:int {id name className:str status:byte nanos aloneNanos:long message:str reached:ints}*n
 *                                          m:int {id name message:str}*m   (failed containers)
 *                                          excludedTagsThatLeftOutTests:strs
 * tool -> worker  RUN        points:ints tests:strs everyTest:byte (1: go on after a failing test; 0: stop after its step)
 *                   reply    STEP count:int (before each group of tests run in one request: the next count tests)
 *                            TEST_DONE id:str status:byte nanos:long message:str (per test run) ... then
 *                            RUN_DONE entered:ints (the schema methods the run entered, and those entered while preparing)
 *                            (status STOPPED: the step was stopped at its deadline; it is the last test reported)
 * tool -> worker  QUIT       (no reply; the worker closes its launcher session and exits through System.exit)
 * any reply may instead be   FAILURE message:str   (the command failed inside the worker; the worker goes on)
 * </pre>
 *
 * A string is an int byte count (-1 for null) and UTF-8 bytes; a list is an int count and its items.
 * Tags are JUnit Platform tag expressions.
 */
public final class Wire {

    public static final int VERSION = 8;
    private static final int MAX_SIZE = 1 << 26;

    public static final byte HELLO = 1;
    public static final byte PREPARE = 2;
    public static final byte PREPARED = 3;
    public static final byte BASELINE = 4;
    public static final byte PROGRESS = 5;
    public static final byte BASELINE_DONE = 6;
    public static final byte RUN = 7;
    public static final byte TEST_DONE = 8;
    public static final byte RUN_DONE = 9;
    public static final byte QUIT = 10;
    public static final byte FAILURE = 11;
    public static final byte STEP = 12;

    /** Sent on the second connection instead of a step number: exit now, as a test JVM does when its tests end. */
    public static final int EXIT = -1;

    /** The test passed. */
    public static final byte PASSED = 0;
    /** The test failed, by a broken assertion or by any other error (its container's failure included). */
    public static final byte FAILED = 1;
    /** An assumption did not hold; the test neither passed nor failed. */
    public static final byte ABORTED = 2;
    /** The test is disabled (or its container is). */
    public static final byte SKIPPED = 3;
    /** No test with that id was found. */
    public static final byte MISSING = 4;
    /** The test was running when its step's deadline passed, and the mutant was stopped in place. */
    public static final byte STOPPED = 5;

    private Wire() {
    }

    public static void writeString(DataOutputStream out, String text) throws IOException {
        if (text == null) {
            out.writeInt(-1);
            return;
        }
        byte[] bytes = text.getBytes(StandardCharsets.UTF_8);
        out.writeInt(bytes.length);
        out.write(bytes);
    }

    public static String readString(DataInputStream in) throws IOException {
        int length = in.readInt();
        if (length < 0) {
            return null;
        }
        checkSize(length);
        byte[] bytes = new byte[length];
        in.readFully(bytes);
        return new String(bytes, StandardCharsets.UTF_8);
    }

    public static void writeStrings(DataOutputStream out, List<String> texts) throws IOException {
        out.writeInt(texts.size());
        for (String text : texts) {
            writeString(out, text);
        }
    }

    public static List<String> readStrings(DataInputStream in) throws IOException {
        int count = checkSize(in.readInt());
        List<String> texts = new ArrayList<>(Math.min(count, 1 << 16));
        for (int i = 0; i < count; i++) {
            texts.add(readString(in));
        }
        return texts;
    }

    public static void writeInts(DataOutputStream out, int[] values) throws IOException {
        out.writeInt(values.length);
        for (int value : values) {
            out.writeInt(value);
        }
    }

    public static int[] readInts(DataInputStream in) throws IOException {
        int[] values = new int[checkSize(in.readInt())];
        for (int i = 0; i < values.length; i++) {
            values[i] = in.readInt();
        }
        return values;
    }

    /** A size no real message has means the two sides disagree about the protocol; fail before allocating it. */
    private static int checkSize(int size) throws IOException {
        if (size < 0 || size > MAX_SIZE) {
            throw new IOException("corrupt message: a size of " + size);
        }
        return size;
    }
}
