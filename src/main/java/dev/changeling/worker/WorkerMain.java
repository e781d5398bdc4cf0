package dev.changeling.worker;

import dev.changeling.probe.Probe;
import java.io.BufferedInputStream;
import java.io.BufferedOutputStream;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.net.InetAddress;
import java.net.Socket;

/**
 * The main class of a worker JVM: {@code WorkerMain <port> <token> <tool pid>} connects back to the tool
 * on the loopback interface and serves its commands until told to quit or the tool goes away.
 */
public final class WorkerMain {

    private WorkerMain() {
    }

    public static void main(String[] args) throws IOException {
        if (args.length != 3) {
            System.err.println("usage: WorkerMain <port> <token> <tool pid>");
            System.exit(2);
        }
        int port = Integer.parseInt(args[0]);
        String token = args[1];
        long toolPid = Long.parseLong(args[2]);
        haltWhenToolIsGone(toolPid);
        Thread.currentThread().setContextClassLoader(ClassLoader.getSystemClassLoader());
        try (Socket socket = new Socket(InetAddress.getLoopbackAddress(), port)) {
            socket.setTcpNoDelay(true);
            DataInputStream in = new DataInputStream(new BufferedInputStream(socket.getInputStream()));
            DataOutputStream out = new DataOutputStream(new BufferedOutputStream(socket.getOutputStream()));
            out.writeByte(Wire.HELLO);
            out.writeInt(Wire.VERSION);
            Wire.writeString(out, token);
            out.writeLong(ProcessHandle.current().pid());
            out.flush();
            listenForStops(port, token);
            new Session(in, out).serve();
        }
        // A test may have left non-daemon threads running; they must not keep this JVM alive.
        System.exit(0);
    }

    /**
     * Opens the second connection, over which the tool names a step whose deadline passed, or asks the JVM to exit;
     * a thread of its own reads it, as the main thread is then busy in the test that runs too long.
     */
    private static void listenForStops(int port, String token) throws IOException {
        Socket control = new Socket(InetAddress.getLoopbackAddress(), port);
        DataOutputStream hello = new DataOutputStream(new BufferedOutputStream(control.getOutputStream()));
        Wire.writeString(hello, token);
        hello.flush();
        DataInputStream stops = new DataInputStream(new BufferedInputStream(control.getInputStream()));
        Thread listener = new Thread(() -> {
            try {
                while (true) {
                    int step = stops.readInt();
                    if (step == Wire.EXIT) {
                        exitAsATestJvmDoes();
                        continue;
                    }
                    Probe.stop(step);
                }
            } catch (IOException toolClosed) {
                // the tool is done with this worker
            }
        }, "changeling-stop-listener");
        listener.setDaemon(true);
        listener.start();
    }

    /**
     * Exits through {@code System.exit}, so the shutdown hooks of the tests run (files marked {@code deleteOnExit}
     * are deleted by one) while a test may still be running. A security manager that refuses leaves it to the
     * tool, which kills the JVM after a grace period.
     */
    private static void exitAsATestJvmDoes() {
        try {
            System.exit(0);
        } catch (SecurityException refused) {
            // the tool kills this JVM when its grace period ends
        }
    }

    /** A test stuck in a loop never reads the socket again, so the tool's death must be noticed apart from it. */
    private static void haltWhenToolIsGone(long toolPid) {
        ProcessHandle.of(toolPid).ifPresentOrElse(
                tool -> tool.onExit().thenRun(() -> Runtime.getRuntime().halt(3)),
                () -> Runtime.getRuntime().halt(3));
    }
}
