package dev.changeling.execution;

import dev.changeling.worker.UniqueIds;
import dev.changeling.worker.Wire;
import java.io.BufferedInputStream;
import java.io.BufferedOutputStream;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.File;
import java.io.IOException;
import java.io.RandomAccessFile;
import java.net.InetAddress;
import java.net.ServerSocket;
import java.net.Socket;
import java.net.SocketTimeoutException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.time.Instant;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.UUID;
import java.util.concurrent.TimeUnit;
import java.util.function.Consumer;

/**
 * One worker JVM seen from the tool: started with the tests' output going to a log file, spoken to over
 * its own loopback socket, and ended the way a test JVM ends (asked to exit, so its shutdown hooks run) on a
 * deadline, on stop or on close; killed, with anything it started, only when it has not exited in time.
 */
final class WorkerProcess {

    /** The worker stopped answering: it ran past a deadline (and was killed) or it died. */
    static final class Lost extends Exception {
        final boolean timedOut;

        Lost(boolean timedOut, String message) {
            super(message);
            this.timedOut = timedOut;
        }
    }

    /** What preparing a worker reported: points reached by class initialisation, classes that failed it. */
    record Prepared(int[] reachedWhileInitialising, List<String> initialisationFailures) {
    }

    /**
     * How long a worker told to stop a step may take to unwind its test and answer before it is killed: a switch
     * throws at once, so a loop through mutated code unwinds in milliseconds; a loop that never passes a switch,
     * or swallows the error, never does.
     */
    static final long STOP_GRACE_MILLIS = 1_000;
    /**
     * How long a worker asked to exit may take to run its shutdown hooks (files marked {@code deleteOnExit} are
     * deleted by one) before it is killed.
     */
    static final long EXIT_GRACE_MILLIS = 2_000;
    private static final int TAIL_BYTES = 8192;
    private static final int TAIL_LINES = 3;
    private static final int TAIL_CHARACTERS = 400;

    private final Process process;
    private final ServerSocket server;
    private final String token;
    private final Path log;
    private final long launchMark;
    private Socket socket;
    private DataInputStream in;
    private DataOutputStream out;
    private Socket control;
    private final Object controlLock = new Object();
    private volatile DataOutputStream stops;
    /** Steps the worker announced so far; the worker numbers them the same way, from 1. */
    private int steps;
    private volatile boolean killed;
    /** Set when the tool asked the worker to exit: its death from then on is no crash. */
    private volatile boolean ending;
    private volatile long exitAskedNanos;
    /** What the worker had started when it was asked to exit: its exit leaves them without a parent to find them by. */
    private volatile List<ProcessHandle> childrenWhenAsked = List.of();
    /** How the worker ended, when it died unasked: "exit 137", say. */
    private volatile String death;
    private final Set<String> containersRun = new HashSet<>();

    private WorkerProcess(Process process, ServerSocket server, String token, Path log) {
        this.process = process;
        this.server = server;
        this.token = token;
        this.log = log;
        this.launchMark = logSize();
    }

    /**
     * Starts the JVM; it is not usable before {@link #connect}. The classpath is {@code first}, then the
     * worker classes, then the project's test classpath; it goes in an argument file, as a long one
     * would not fit on a command line.
     */
    static WorkerProcess launch(WorkerSettings settings, Path workerClasses, List<Path> first, Path log, Path temp,
                                Path argumentFile) throws IOException {
        Files.createDirectories(temp);
        Files.createDirectories(log.toAbsolutePath().getParent());
        List<Path> classpath = new ArrayList<>(first);
        classpath.add(workerClasses);
        classpath.addAll(settings.classpath());
        StringBuilder joined = new StringBuilder();
        for (Path entry : classpath) {
            joined.append(joined.length() == 0 ? "" : File.pathSeparator).append(entry.toAbsolutePath());
        }
        Files.writeString(argumentFile, "-cp\n" + quoted(joined.toString()) + "\n", StandardCharsets.UTF_8);

        ServerSocket server = new ServerSocket(0, 2, InetAddress.getLoopbackAddress());
        String token = UUID.randomUUID().toString();
        List<String> command = new ArrayList<>();
        command.add(settings.javaExecutable().toString());
        command.add("-Xmx" + settings.maxHeap());
        command.add("-Djava.io.tmpdir=" + temp.toAbsolutePath());
        command.addAll(WorkerSettings.TUNING);
        command.addAll(settings.jvmArguments());
        // After the options, as the build's test JVM sets them after its argLine: the last -D of a name wins.
        settings.systemProperties().forEach((name, value) -> command.add("-D" + name + "=" + value));
        command.add("@" + argumentFile.toAbsolutePath());
        command.add(WorkerClasses.MAIN_CLASS);
        command.add(Integer.toString(server.getLocalPort()));
        command.add(token);
        command.add(Long.toString(ProcessHandle.current().pid()));

        Files.writeString(log, "---- worker started " + Instant.now() + "\n", StandardCharsets.UTF_8,
                StandardOpenOption.CREATE, StandardOpenOption.APPEND);
        ProcessBuilder builder = new ProcessBuilder(command)
                .directory(settings.workingDirectory().toFile())
                .redirectErrorStream(true)
                .redirectOutput(ProcessBuilder.Redirect.appendTo(log.toFile()));
        builder.environment().putAll(settings.environment());
        Process process;
        try {
            process = builder.start();
        } catch (IOException e) {
            server.close();
            throw e;
        }
        WorkerProcess worker = new WorkerProcess(process, server, token, log);
        Reaper.watch(worker);
        // Tests that read System.in see its end rather than waiting forever.
        process.getOutputStream().close();
        process.onExit().thenRun(worker::closeServer);
        return worker;
    }

    /** Waits for the JVM to call back and say hello. */
    void connect(long timeoutMillis) throws Lost {
        long deadline = System.nanoTime() + TimeUnit.MILLISECONDS.toNanos(timeoutMillis);
        try {
            server.setSoTimeout((int) Math.max(1, Math.min(Integer.MAX_VALUE, timeoutMillis)));
            socket = server.accept();
            socket.setTcpNoDelay(true);
            in = new DataInputStream(new BufferedInputStream(socket.getInputStream()));
            out = new DataOutputStream(new BufferedOutputStream(socket.getOutputStream()));
            byte hello = next(deadline);
            int version = in.readInt();
            String answer = Wire.readString(in);
            in.readLong();
            if (hello != Wire.HELLO || version != Wire.VERSION || !token.equals(answer)) {
                end();
                throw new IllegalStateException("the process that answered is not this tool's worker, or speaks protocol " + version
                        + " instead of " + Wire.VERSION);
            }
            control = server.accept();
            closeServer();
            control.setTcpNoDelay(true);
            control.setSoTimeout((int) Math.max(1, TimeUnit.NANOSECONDS.toMillis(deadline - System.nanoTime())));
            if (!token.equals(Wire.readString(new DataInputStream(new BufferedInputStream(control.getInputStream()))))) {
                end();
                throw new IllegalStateException("the second connection is not this worker's");
            }
            stops = new DataOutputStream(new BufferedOutputStream(control.getOutputStream()));
        } catch (SocketTimeoutException e) {
            end();
            throw new Lost(true, "the worker JVM did not start within " + timeoutMillis + " ms");
        } catch (IOException e) {
            throw died(launchMark);
        }
    }

    Prepared prepare(SuiteSetup setup, long timeoutMillis) throws Lost {
        long deadline = System.nanoTime() + TimeUnit.MILLISECONDS.toNanos(timeoutMillis);
        long mark = logSize();
        try {
            out.writeByte(Wire.PREPARE);
            out.writeInt(setup.pointCount());
            out.writeInt(setup.methodCount());
            Wire.writeStrings(out, setup.preinitialise());
            Wire.writeStrings(out, setup.includedTags());
            Wire.writeStrings(out, setup.excludedTags());
            Wire.writeStrings(out, setup.configurationParameters().entrySet().stream()
                    .flatMap(parameter -> java.util.stream.Stream.of(parameter.getKey(), parameter.getValue())).toList());
            out.flush();
            expect(Wire.PREPARED, next(deadline));
            return new Prepared(Wire.readInts(in), Wire.readStrings(in));
        } catch (SocketTimeoutException e) {
            end();
            throw new Lost(true, "preparing the worker took more than " + timeoutMillis + " ms");
        } catch (IOException e) {
            throw died(mark);
        }
    }

    /** Runs the unmutated tests of these classes, recording each test's result, time and reach. */
    Baseline baseline(Prepared prepared, List<String> testClasses, Consumer<String> onTestFinished, long timeoutMillis) throws Lost {
        long start = System.nanoTime();
        long deadline = start + TimeUnit.MILLISECONDS.toNanos(timeoutMillis);
        long mark = logSize();
        try {
            out.writeByte(Wire.BASELINE);
            Wire.writeStrings(out, testClasses);
            out.flush();
            byte code;
            while ((code = next(deadline)) == Wire.PROGRESS) {
                onTestFinished.accept(Wire.readString(in));
            }
            expect(Wire.BASELINE_DONE, code);
            List<RecordedTest> tests = new ArrayList<>();
            for (int count = in.readInt(); count > 0; count--) {
                String id = Wire.readString(in);
                String name = Wire.readString(in);
                String className = Wire.readString(in);
                TestStatus status = TestStatus.fromWire(in.readByte());
                long nanos = in.readLong();
                long aloneNanos = in.readLong();
                String message = Wire.readString(in);
                tests.add(new RecordedTest(id, name, className, status, message, nanos, aloneNanos, Wire.readInts(in)));
            }
            List<FailedContainer> containers = new ArrayList<>();
            for (int count = in.readInt(); count > 0; count--) {
                containers.add(new FailedContainer(Wire.readString(in), Wire.readString(in), Wire.readString(in)));
            }
            List<String> tagsThatLeftOutTests = Wire.readStrings(in);
            return new Baseline(tests, containers, prepared.reachedWhileInitialising(), prepared.initialisationFailures(),
                    System.nanoTime() - start).withTagsThatLeftOutTests(tagsThatLeftOutTests);
        } catch (SocketTimeoutException e) {
            end();
            throw new Lost(true, "the unmutated suite took more than " + timeoutMillis + " ms");
        } catch (IOException e) {
            throw died(mark);
        }
    }

    /**
     * Runs one mutant's tests; a deadline or the worker's death becomes the outcome. Each step the worker announces
     * gets its own deadline, from the baseline times of the tests in it. At a step's deadline the worker is told to
     * stop that step in place (its switches throw); only if it has not answered within {@link #STOP_GRACE_MILLIS}
     * more is it ended.
     */
    JobResult run(MutantJob job) {
        long start = System.nanoTime();
        long allowed = job.stepMillis(0, 0, false);
        long deadline = start + TimeUnit.MILLISECONDS.toNanos(allowed);
        long mark = logSize();
        boolean stopSent = false;
        List<TestRun> runs = new ArrayList<>();
        BitSet entered;
        try {
            out.writeByte(Wire.RUN);
            Wire.writeInts(out, job.points());
            Wire.writeStrings(out, job.tests());
            out.writeByte(job.everyTest() ? 1 : 0);
            out.flush();
            while (true) {
                byte code;
                try {
                    code = next(deadline);
                } catch (SocketTimeoutException expired) {
                    if (stopSent || steps == 0) {
                        throw expired;
                    }
                    tell(steps);
                    stopSent = true;
                    deadline = System.nanoTime() + TimeUnit.MILLISECONDS.toNanos(STOP_GRACE_MILLIS);
                    continue;
                }
                if (code == Wire.STEP) {
                    int count = in.readInt();
                    steps++;
                    allowed = job.stepMillis(runs.size(), count, firstRunOfAClass(job.tests(), runs.size(), count));
                    deadline = System.nanoTime() + TimeUnit.MILLISECONDS.toNanos(allowed);
                    continue;
                }
                if (code != Wire.TEST_DONE) {
                    expect(Wire.RUN_DONE, code);
                    entered = JobResult.entered(Wire.readInts(in));
                    break;
                }
                String id = Wire.readString(in);
                TestStatus status = TestStatus.fromWire(in.readByte());
                long nanos = in.readLong();
                runs.add(new TestRun(id, status, nanos, Wire.readString(in)));
            }
        } catch (SocketTimeoutException e) {
            end();
            return new JobResult(job.key(), Outcome.TIMED_OUT, running(job, runs),
                    "no answer within " + allowed + " ms" + (stopSent ? ", nor " + STOP_GRACE_MILLIS + " ms after the stop;"
                            + " the worker was ended" : ""), runs, System.nanoTime() - start).decidedByAnEarlierFailure();
        } catch (IOException e) {
            Lost lost = died(mark);
            return new JobResult(job.key(), Outcome.CRASHED, running(job, runs), lost.getMessage(), runs, System.nanoTime() - start)
                    .decidedByAnEarlierFailure();
        }
        long nanos = System.nanoTime() - start;
        for (TestRun test : runs) {
            if (test.status() == TestStatus.STOPPED) {
                return new JobResult(job.key(), Outcome.TIMED_OUT, test.testId(),
                        "no answer within " + allowed + " ms; stopped in place", runs, nanos, entered).decidedByAnEarlierFailure();
            }
        }
        for (TestRun test : runs) {
            if (test.status() == TestStatus.FAILED) {
                return new JobResult(job.key(), Outcome.KILLED, test.testId(), test.message(), runs, nanos, entered);
            }
        }
        return new JobResult(job.key(), Outcome.SURVIVED, null, null, runs, nanos, entered);
    }

    /** Whether the JVM still runs: after a step was stopped in place, say, where a timeout used to mean a kill. */
    boolean alive() {
        return !killed && process.isAlive();
    }

    /** Whether these tests include one whose class (or other container) this worker has not run a test of yet. */
    private boolean firstRunOfAClass(List<String> tests, int from, int count) {
        boolean first = false;
        for (String test : tests.subList(Math.min(from, tests.size()), Math.min(tests.size(), from + count))) {
            String parent = UniqueIds.parent(test);
            first |= containersRun.add(parent == null ? test : parent);
        }
        return first;
    }

    /** The test that was running when the answer stopped: the first one not reported. */
    private static String running(MutantJob job, List<TestRun> finished) {
        return finished.size() < job.tests().size() ? job.tests().get(finished.size()) : null;
    }

    /**
     * Tells an idle worker to quit, as at the end of a run (it closes its launcher session, then exits), and
     * kills it if it has not within {@link #EXIT_GRACE_MILLIS}. A worker that cannot be told is ended.
     */
    void close() {
        if (out == null || ending || !process.isAlive()) {
            end();
            return;
        }
        markEnding();
        try {
            out.writeByte(Wire.QUIT);
            out.flush();
        } catch (IOException ignored) {
            // it is going away anyway
        }
        awaitExit();
    }

    /**
     * Ends the JVM the way a test JVM ends, whatever it is doing: asked to exit, so its shutdown hooks run, and
     * killed with anything it started if it has not exited within {@link #EXIT_GRACE_MILLIS}.
     */
    void end() {
        askToExit();
        awaitExit();
    }

    /**
     * Asks the JVM to exit, over the connection that is read even while a test runs, and returns at once; any
     * thread may call it. {@link #awaitExit} then waits for the exit.
     */
    void askToExit() {
        if (stops == null || !process.isAlive() || !markEnding()) {
            return;
        }
        tell(Wire.EXIT);
    }

    /** Waits out what is left of the grace period since the worker was asked to exit, then kills what is left. */
    void awaitExit() {
        long left = EXIT_GRACE_MILLIS - TimeUnit.NANOSECONDS.toMillis(System.nanoTime() - exitAskedNanos);
        if (ending && left > 0) {
            try {
                process.waitFor(left, TimeUnit.MILLISECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }
        kill();
    }

    /** Marks the worker as ending and notes what it runs; false when that was done already. */
    private synchronized boolean markEnding() {
        if (ending) {
            return false;
        }
        childrenWhenAsked = process.descendants().toList();
        exitAskedNanos = System.nanoTime();
        ending = true;
        return true;
    }

    /** Writes a number on the second connection: a step to stop, or {@link Wire#EXIT}. */
    private void tell(int number) {
        synchronized (controlLock) {
            try {
                stops.writeInt(number);
                stops.flush();
            } catch (IOException ignored) {
                // the worker is gone already; waiting for it finds that out
            }
        }
    }

    /** How the worker ended when it died unasked ("exit 137"), or null while it has not. */
    String death() {
        return death;
    }

    /** Kills the JVM and every process it started, and waits until they are gone; {@link Reaper} kills leftovers so. */
    void kill() {
        killed = true;
        List<ProcessHandle> descendants = new ArrayList<>(childrenWhenAsked);
        descendants.addAll(process.descendants().toList());
        process.destroyForcibly();
        descendants.forEach(ProcessHandle::destroyForcibly);
        closeQuietly(socket);
        closeQuietly(control);
        closeServer();
        try {
            process.onExit().get(10, TimeUnit.SECONDS);
            for (ProcessHandle child : descendants) {
                child.onExit().get(10, TimeUnit.SECONDS);
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        } catch (Exception ignored) {
            // a process that will not die within seconds is left to the operating system
        }
        Reaper.forget(this);
    }

    /** Reads the next message code, waiting no longer than the deadline; a worker's failure report is thrown. */
    private byte next(long deadlineNanos) throws IOException {
        if (in.available() == 0) {
            long remaining = TimeUnit.NANOSECONDS.toMillis(deadlineNanos - System.nanoTime());
            if (remaining <= 0) {
                throw new SocketTimeoutException("deadline passed");
            }
            socket.setSoTimeout((int) Math.min(Integer.MAX_VALUE, remaining));
        }
        byte code = in.readByte();
        if (code == Wire.FAILURE) {
            throw new IllegalStateException("a worker failed: " + Wire.readString(in) + " (log: " + log + ")");
        }
        return code;
    }

    private static void expect(byte expected, byte actual) {
        if (expected != actual) {
            throw new IllegalStateException("a worker sent message " + actual + " where " + expected + " was due");
        }
    }

    /** The worker is gone: says how it ended (exit code and its last line of output) and makes sure it is dead. */
    private Lost died(long logMark) {
        boolean wasEnded = killed || ending;
        try {
            process.waitFor(5, TimeUnit.SECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
        boolean exited = !process.isAlive();
        String how = exited ? "the worker JVM exited with code " + process.exitValue() : "the worker JVM closed its connection";
        if (!wasEnded) {
            death = exited ? "exit " + process.exitValue() : "it closed its connection";
        }
        end();
        if (wasEnded) {
            return new Lost(false, "the worker JVM was stopped");
        }
        String last = lastLines(logMark);
        return new Lost(false, last.isEmpty() ? how : how + "; last output: " + last);
    }

    /** The last few lines the worker printed since {@code from}, joined: the JVM's own last words often take three. */
    private String lastLines(long from) {
        try (RandomAccessFile file = new RandomAccessFile(log.toFile(), "r")) {
            long start = Math.max(from, file.length() - TAIL_BYTES);
            byte[] bytes = new byte[(int) Math.max(0, file.length() - start)];
            file.seek(start);
            file.readFully(bytes);
            List<String> lines = new ArrayList<>();
            for (String line : new String(bytes, StandardCharsets.UTF_8).split("\\R")) {
                if (!line.isBlank()) {
                    lines.add(line.strip());
                }
            }
            String text = String.join(" / ", lines.subList(Math.max(0, lines.size() - TAIL_LINES), lines.size()));
            return text.length() <= TAIL_CHARACTERS ? text : "…" + text.substring(text.length() - TAIL_CHARACTERS + 1);
        } catch (IOException ignored) {
            return "";
        }
    }

    private long logSize() {
        try {
            return Files.size(log);
        } catch (IOException e) {
            return 0;
        }
    }

    private void closeServer() {
        closeQuietly(server);
    }

    private static void closeQuietly(AutoCloseable closeable) {
        if (closeable == null) {
            return;
        }
        try {
            closeable.close();
        } catch (Exception ignored) {
            // closing is best effort
        }
    }

    /** Java argument files group by double quotes and take backslash escapes inside them. */
    private static String quoted(String text) {
        return "\"" + text.replace("\\", "\\\\").replace("\"", "\\\"") + "\"";
    }
}
