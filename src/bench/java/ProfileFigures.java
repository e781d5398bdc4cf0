import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Predicate;
import java.util.stream.Stream;
import jdk.jfr.consumer.RecordedEvent;
import jdk.jfr.consumer.RecordedFrame;
import jdk.jfr.consumer.RecordedStackTrace;
import jdk.jfr.consumer.RecordingFile;

/**
 * Where a run's CPU went, from the flight recordings of the tool and of every worker that exited normally (a folder of
 * them, one per JVM): the workers' Java samples by what they were doing (the tests' own code, the switches in it, JUnit
 * finding the tests of a request, JUnit around the tests, preparing a fresh worker, the rest), the tool's samples by
 * phase, and each side's JIT compilation time and collector pauses. Samples are of threads running Java code, so they
 * give shares, not seconds; the JIT and the collector run on threads of their own and are given in seconds.
 */
public final class ProfileFigures {

    /** A category and the frames, any of which puts a sample in it; the first category that matches wins. */
    private record Category(String name, Predicate<List<String>> matches) {
    }

    private static Predicate<List<String>> anyFrame(String... parts) {
        return frames -> frames.stream().anyMatch(frame -> Stream.of(parts).anyMatch(frame::contains));
    }

    private static final List<Category> WORKER = List.of(
            new Category("the switches in the tests (Probe)", frames -> frames.get(0).startsWith("dev.changeling.probe.Probe")
                    && anyFrame("invokeTestMethod").test(frames)),
            new Category("the tests' own code", anyFrame("TestMethodTestDescriptor.invokeTestMethod", "runners.ParentRunner")),
            new Category("JUnit finding a request's tests", anyFrame("DefaultLauncher.discover", "EngineDiscoveryOrchestrator",
                    "LauncherDiscoveryRequestBuilder", "Suite.runOne", "Suite.runTogether")
                    .and(anyFrame("DefaultLauncher.execute", "EngineExecutionOrchestrator").negate())),
            new Category("JUnit around the tests (extensions, lifecycle, listeners)", anyFrame("DefaultLauncher.execute",
                    "EngineExecutionOrchestrator", "HierarchicalTestExecutor")),
            new Category("preparing a fresh worker", anyFrame("Session.prepare", "WorkerMain.main")),
            new Category("the rest (class loading, the wire)", frames -> true));

    private static final List<Category> TOOL = List.of(
            new Category("compare survivors (javac)", anyFrame("CompilerEquivalence", "SurvivorComparison")),
            new Category("compile the schema (javac)", anyFrame("SchemaCompiler", "SchemaStage", "MutantBuild", "AloneCompiler")),
            new Category("generate (parse, find points)", anyFrame("Generation", "com.github.javaparser")),
            new Category("execute: the pool's threads", anyFrame("WorkerSlot", "DefaultWorkerPool", "WorkerProcess")),
            new Category("the rest", frames -> true));

    private static final class Tally {
        final Map<String, Long> samples = new LinkedHashMap<>();
        long total;
        long jitNanos;
        long pauseNanos;
        int recordings;

        Tally(List<Category> categories) {
            categories.forEach(category -> samples.put(category.name(), 0L));
        }
    }

    public static void main(String[] args) throws IOException {
        Path folder = Path.of(args[0]);
        int workersStarted = args.length > 1 ? Integer.parseInt(args[1]) : -1;
        Tally workers = new Tally(WORKER);
        Tally tool = new Tally(TOOL);
        List<Path> recordings;
        try (Stream<Path> files = Files.list(folder)) {
            recordings = files.filter(file -> file.toString().endsWith(".jfr")).sorted().toList();
        }
        for (Path recording : recordings) {
            List<RecordedEvent> events = RecordingFile.readAllEvents(recording);
            String command = events.stream().filter(event -> event.getEventType().getName().equals("jdk.JVMInformation"))
                    .map(event -> event.getString("javaArguments")).findFirst().orElse("");
            boolean worker = command.contains("dev.changeling.worker.WorkerMain");
            // the JVM the user started, and the one it started again with the client compiler only (ToolJvm)
            boolean isTool = command.contains("changeling") && command.contains(" run");
            if (!worker && !isTool) {
                continue;
            }
            Tally tally = worker ? workers : tool;
            tally.recordings++;
            long jit = 0;
            for (RecordedEvent event : events) {
                switch (event.getEventType().getName()) {
                    case "jdk.ExecutionSample" -> count(tally, worker ? WORKER : TOOL, event.getStackTrace());
                    // periodic, counting from the JVM's start: the last is the JVM's total
                    case "jdk.CompilerStatistics" -> jit = Math.max(jit, event.getDuration("totalTimeSpent").toNanos());
                    case "jdk.GarbageCollection" -> tally.pauseNanos += event.getDuration("sumOfPauses").toNanos();
                    default -> { }
                }
            }
            tally.jitNanos += jit;
        }
        print("workers", workers, workersStarted < 0 ? "" : " of " + workersStarted + " started (a worker the tool had to kill leaves none)");
        print("tool", tool, "");
    }

    private static void count(Tally tally, List<Category> categories, RecordedStackTrace stack) {
        if (stack == null || stack.getFrames().isEmpty()) {
            return;
        }
        List<String> frames = new ArrayList<>();
        for (RecordedFrame frame : stack.getFrames()) {
            frames.add(frame.getMethod().getType().getName() + "." + frame.getMethod().getName());
        }
        for (Category category : categories) {
            if (category.matches().test(frames)) {
                tally.samples.merge(category.name(), 1L, Long::sum);
                tally.total++;
                return;
            }
        }
    }

    private static void print(String side, Tally tally, String note) {
        System.out.printf("%s: %d recordings%s; %d samples of Java code%n", side, tally.recordings, note, tally.total);
        tally.samples.forEach((name, count) -> System.out.printf("  %5.1f %%  %s%n",
                tally.total == 0 ? 0 : 100.0 * count / tally.total, name));
        System.out.printf("  JIT compilation %.1f s, collector pauses %.1f s (their own threads; added up over the %s)%n",
                Duration.ofNanos(tally.jitNanos).toMillis() / 1000.0, Duration.ofNanos(tally.pauseNanos).toMillis() / 1000.0,
                side.equals("tool") ? "tool" : "workers");
    }
}
