package dev.changeling.cli;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import sun.misc.Signal;

/**
 * The JVM that {@code run} works in. A run compiles with javac and parses with JavaParser for seconds, not minutes, and
 * the optimising JIT spent a fifth of the run's CPU compiling that code on two cores (26.7 s of 120 s on commons-cli's
 * full run), on the cores the workers need. With the client compiler only, the whole run took 0.85 of the time
 * ({@code farm-bench -n 5}, median of the pairs). A running JVM cannot change its compiler and a jar cannot name JVM options, so {@code run}
 * starts itself once more in a JVM with {@value #CLIENT_COMPILER_ONLY} and the options this one was given, passes
 * Ctrl-C and termination on, and exits as that JVM does.
 *
 * <p>It does not when the JVM was given a compiler option or an agent of the user's own (a debugger, a coverage agent),
 * is the relaunched one already, or cannot start another: then the run works in this JVM, as before.
 */
final class ToolJvm {

    static final String CLIENT_COMPILER_ONLY = "-XX:TieredStopAtLevel=1";
    /** Set in the relaunched JVM, which must not start another. */
    static final String RELAUNCHED = "changeling.relaunched";

    /** Options that say the user chose the JIT, or attached something that would not survive a second JVM. */
    private static final List<String> OWN_CHOICES = List.of("-XX:TieredStopAtLevel", "-XX:-TieredCompilation",
            "-XX:+TieredCompilation", "-Xint", "-Xcomp", "-XX:+UseJVMCICompiler", "-agentlib", "-agentpath", "-javaagent",
            "-Xrunjdwp", "-Xdebug");
    /** Environment variables whose options the java launcher reads itself, so the relaunched JVM gets them anyway. */
    private static final List<String> LAUNCHER_VARIABLES = List.of("JAVA_TOOL_OPTIONS", "JDK_JAVA_OPTIONS");

    private ToolJvm() {
    }

    /**
     * The command line of a JVM with the client compiler only that runs these arguments, or nothing when this one should
     * do the work itself.
     *
     * @param jvmArguments the options this JVM was started with, as the runtime lists them
     */
    static Optional<List<String>> relaunch(String[] args, List<String> jvmArguments, Map<String, String> environment,
                                           Path javaHome, String classpath, boolean relaunched) {
        if (relaunched || args.length == 0 || !args[0].equals("run") || classpath == null || classpath.isEmpty()) {
            return Optional.empty();
        }
        List<String> own = new ArrayList<>(jvmArguments);
        for (String variable : LAUNCHER_VARIABLES) {
            String value = environment.get(variable);
            if (value != null) {
                Arrays.stream(value.trim().split("\\s+")).filter(option -> !option.isEmpty()).forEach(own::remove);
            }
        }
        if (jvmArguments.stream().anyMatch(option -> OWN_CHOICES.stream().anyMatch(option::startsWith))) {
            return Optional.empty();
        }
        List<String> command = new ArrayList<>();
        command.add(javaHome.resolve("bin").resolve(windows() ? "java.exe" : "java").toString());
        command.add(CLIENT_COMPILER_ONLY);
        command.addAll(own);
        command.add("-D" + RELAUNCHED + "=true");
        command.addAll(List.of("-cp", classpath, Main.class.getName()));
        command.addAll(List.of(args));
        return Optional.of(command);
    }

    /** {@link #relaunch(String[], List, Map, Path, String, boolean)} for this JVM. */
    static Optional<List<String>> relaunch(String[] args) {
        return relaunch(args, ManagementFactory.getRuntimeMXBean().getInputArguments(), System.getenv(),
                Path.of(System.getProperty("java.home")), System.getProperty("java.class.path"), Boolean.getBoolean(RELAUNCHED));
    }

    /**
     * Runs the command with this JVM's standard streams and waits for it, passing Ctrl-C and termination signals on;
     * its exit code, or nothing when it could not be started.
     */
    static Optional<Integer> runIn(List<String> command) {
        return start(command).map(child -> {
            passSignalsTo(child);
            return exitOf(child);
        });
    }

    /** The command started with this JVM's standard streams, or nothing when it cannot start. */
    static Optional<Process> start(List<String> command) {
        try {
            return Optional.of(new ProcessBuilder(command).inheritIO().start());
        } catch (IOException cannotStart) {
            return Optional.empty();
        }
    }

    /**
     * From now on Ctrl-C and termination signals to this JVM go to the child instead of ending this one. A terminal's
     * Ctrl-C reaches both already; a signal to this one alone must reach the run too. On Windows the console tells
     * every process attached to it, and there is nothing to pass on.
     */
    private static void passSignalsTo(Process child) {
        if (windows()) {
            return;
        }
        for (String signal : List.of("INT", "TERM", "HUP")) {
            try {
                Signal.handle(new Signal(signal), received -> passOn(signal, child));
            } catch (IllegalArgumentException notHere) {
                // the JVM reserves it or the platform lacks it
            }
        }
    }

    /** Waits for the child's end, however long the run takes; its exit code. */
    static int exitOf(Process child) {
        while (true) {
            try {
                return child.waitFor();
            } catch (InterruptedException e) {
                // keep waiting: the run decides when it is over
            }
        }
    }

    private static void passOn(String signal, Process child) {
        try {
            Process kill = new ProcessBuilder("kill", "-" + signal, Long.toString(child.pid()))
                    .redirectOutput(ProcessBuilder.Redirect.DISCARD).redirectError(ProcessBuilder.Redirect.DISCARD).start();
            if (kill.waitFor(5, TimeUnit.SECONDS) && kill.exitValue() == 0) {
                return;
            }
        } catch (IOException | InterruptedException noKillCommand) {
            // ask it to end the one way Java can
        }
        child.destroy();
    }

    private static boolean windows() {
        return System.getProperty("os.name", "").toLowerCase(Locale.ROOT).startsWith("windows");
    }
}
