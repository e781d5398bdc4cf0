package dev.changeling.project;

import java.io.File;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;

/**
 * Runs one test class in a fresh JVM on exactly a given classpath through the JUnit Platform Launcher API,
 * the way a worker will, and returns what it printed: proof that a classpath really runs its tests.
 */
final class PlatformRun {

    private static final String PROGRAM = """
            import org.junit.platform.engine.TestEngine;
            import org.junit.platform.launcher.Launcher;
            import org.junit.platform.launcher.core.LauncherDiscoveryRequestBuilder;
            import org.junit.platform.launcher.core.LauncherFactory;
            import org.junit.platform.launcher.listeners.SummaryGeneratingListener;
            import org.junit.platform.launcher.listeners.TestExecutionSummary;
            import static org.junit.platform.engine.discovery.DiscoverySelectors.selectClass;

            public class RunOneClass {
                public static void main(String[] args) {
                    SummaryGeneratingListener listener = new SummaryGeneratingListener();
                    LauncherFactory.create().execute(LauncherDiscoveryRequestBuilder.request().selectors(selectClass(args[0])).build(), listener);
                    TestExecutionSummary summary = listener.getSummary();
                    System.out.println("found " + summary.getTestsFoundCount() + ", succeeded " + summary.getTestsSucceededCount());
                    System.out.println("launcher " + Launcher.class.getPackage().getImplementationVersion()
                            + ", engine API " + TestEngine.class.getPackage().getImplementationVersion());
                }
            }
            """;

    private PlatformRun() {
    }

    static String run(List<Path> classpath, String testClass, Path workingDirectory, Path scratch) {
        try {
            Path program = scratch.resolve("RunOneClass.java");
            Files.createDirectories(scratch);
            Files.writeString(program, PROGRAM);
            String javaProgram = Path.of(System.getProperty("java.home"), "bin", "java").toString();
            String path = classpath.stream().map(Path::toString).collect(Collectors.joining(File.pathSeparator));
            Process process = new ProcessBuilder(javaProgram, "-cp", path, program.toString(), testClass)
                    .directory(workingDirectory.toFile())
                    .redirectErrorStream(true)
                    .start();
            process.getOutputStream().close();
            String output = new String(process.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
            process.waitFor();
            return output;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException(e);
        }
    }
}
