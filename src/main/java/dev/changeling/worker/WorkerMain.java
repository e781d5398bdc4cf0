package dev.changeling.worker;

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
            new Session(in, out).serve();
        }
        // A test may have left non-daemon threads running; they must not keep this JVM alive.
        System.exit(0);
    }

    /** A test stuck in a loop never reads the socket again, so the tool's death must be noticed apart from it. */
    private static void haltWhenToolIsGone(long toolPid) {
        ProcessHandle.of(toolPid).ifPresentOrElse(
                tool -> tool.onExit().thenRun(() -> Runtime.getRuntime().halt(3)),
                () -> Runtime.getRuntime().halt(3));
    }
}
