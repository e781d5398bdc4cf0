import dev.changeling.mutant.Generation;
import dev.changeling.mutant.MutantRequest;
import dev.changeling.operator.MutationOperator;
import dev.changeling.operator.Operators;
import dev.changeling.source.JavaSources;
import dev.changeling.source.SourceFile;
import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadInfo;
import java.lang.management.ThreadMXBean;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.stream.Collectors;
import java.util.stream.Stream;

/**
 * Measures how fast a project's main sources turn into first-order mutants with the default operators, through the
 * same public calls the tool makes: parse only (one thread), and parse plus generation (which parses on every core).
 * CPU time is that of the threads doing the work (this one and the common fork-join pool's), so lines per CPU second
 * are lines per second per core however many cores take part.
 *
 * <pre>java -cp target/changeling.jar:target/bench/classes GenerationBenchmark PROJECT [WARMUP] [MEASURED]</pre>
 */
public final class GenerationBenchmark {

    private static final ThreadMXBean THREADS = ManagementFactory.getThreadMXBean();

    /** The figure the generation step is meant to reach on one warm core. */
    private static final double TARGET_LINES_PER_SECOND = 40_000;

    private GenerationBenchmark() {
    }

    public static void main(String[] args) throws IOException {
        if (args.length < 1) {
            System.err.println("usage: GenerationBenchmark PROJECT_DIR [WARMUP_ITERATIONS] [MEASURED_ITERATIONS]");
            System.exit(2);
        }
        Path project = Path.of(args[0]).toAbsolutePath().normalize();
        int warmup = args.length > 1 ? Integer.parseInt(args[1]) : 20;
        int measured = args.length > 2 ? Integer.parseInt(args[2]) : 10;

        List<SourceFile> sources = readMainSources(project);
        List<MutationOperator> operators = Operators.defaults();
        MutantRequest request = MutantRequest.firstOrder(operators);
        Generation.Generated first = Generation.generate(sources, request);

        System.out.printf(Locale.ROOT, "project    %s%n", project);
        System.out.printf(Locale.ROOT, "operators  %s%n",
                operators.stream().map(MutationOperator::id).collect(Collectors.joining(", ")));
        System.out.printf(Locale.ROOT, "totals     %d files, %d lines, %d first-order mutants, %d files not parsed%n",
                sources.size(), first.lines(), first.mutants().size(), first.problems().size());
        System.out.printf(Locale.ROOT, "iterations %d warm-up, %d measured, CPU of the working threads%n", warmup, measured);

        long lines = first.lines();
        int mutants = first.mutants().size();
        List<Timing> timings = measure(warmup, measured, List.of(
                () -> parseAll(sources),
                () -> Generation.generate(sources, request).mutants().size()));
        Timing parsing = timings.get(0);
        Timing generation = timings.get(1);

        report("parse only", parsing, lines, -1);
        report("parse + generate", generation, lines, mutants);
        System.out.printf(Locale.ROOT, "target     %,.0f lines/s per core, warm (parse + generate, median CPU): %s%n",
                TARGET_LINES_PER_SECOND,
                lines / generation.medianCpuSeconds() >= TARGET_LINES_PER_SECOND ? "reached" : "not reached");
    }

    private static List<SourceFile> readMainSources(Path project) throws IOException {
        Path main = project.resolve("src/main/java");
        if (!Files.isDirectory(main)) {
            throw new IOException("no src/main/java in " + project + "; run src/bench/commons-cli/setup.sh first");
        }
        List<SourceFile> sources = new ArrayList<>();
        try (Stream<Path> files = Files.walk(main)) {
            for (Path file : files.filter(path -> path.toString().endsWith(".java")).sorted().toList()) {
                sources.add(JavaSources.read(project, file));
            }
        }
        return sources;
    }

    private static int parseAll(List<SourceFile> sources) {
        int parsed = 0;
        for (SourceFile source : sources) {
            if (JavaSources.parse(source).ok()) {
                parsed++;
            }
        }
        return parsed;
    }

    /** Wall and thread-CPU seconds of each measured iteration; the CPU figure is what one core spent. */
    private record Timing(double[] wallSeconds, double[] cpuSeconds, long checksum) {

        double medianWallSeconds() {
            return median(wallSeconds);
        }

        double medianCpuSeconds() {
            return median(cpuSeconds);
        }

        double bestCpuSeconds() {
            return Arrays.stream(cpuSeconds).min().orElseThrow();
        }

        private static double median(double[] values) {
            double[] sorted = values.clone();
            Arrays.sort(sorted);
            int middle = sorted.length / 2;
            return sorted.length % 2 == 1 ? sorted[middle] : (sorted[middle - 1] + sorted[middle]) / 2;
        }
    }

    private interface Work {
        int run();
    }

    /**
     * Runs the pieces of work in turn, iteration by iteration, so that each is as warm as the other when
     * it is timed; returns one timing per piece.
     */
    private static List<Timing> measure(int warmup, int measured, List<Work> works) {
        // The checksum keeps the JIT from dropping work whose result nobody reads.
        long[] checksum = new long[works.size()];
        for (int iteration = 0; iteration < warmup; iteration++) {
            for (int piece = 0; piece < works.size(); piece++) {
                checksum[piece] += works.get(piece).run();
            }
        }
        double[][] wall = new double[works.size()][measured];
        double[][] cpu = new double[works.size()][measured];
        for (int iteration = 0; iteration < measured; iteration++) {
            for (int piece = 0; piece < works.size(); piece++) {
                long cpuStart = workCpuNanos();
                long wallStart = System.nanoTime();
                checksum[piece] += works.get(piece).run();
                wall[piece][iteration] = (System.nanoTime() - wallStart) / 1e9;
                cpu[piece][iteration] = (workCpuNanos() - cpuStart) / 1e9;
            }
        }
        List<Timing> timings = new ArrayList<>();
        for (int piece = 0; piece < works.size(); piece++) {
            timings.add(new Timing(wall[piece], cpu[piece], checksum[piece]));
        }
        return timings;
    }

    private static void report(String label, Timing timing, long lines, int mutants) {
        double cpu = timing.medianCpuSeconds();
        double wall = timing.medianWallSeconds();
        String mutantRate = mutants < 0 ? "" : String.format(Locale.ROOT, ", %,.0f mutants/s", mutants / cpu);
        System.out.printf(Locale.ROOT, "%-17s median %.1f ms CPU (%.1f ms wall): %,.0f lines/s per core%s; best %,.0f lines/s%n",
                label, cpu * 1e3, wall * 1e3, lines / cpu, mutantRate, lines / timing.bestCpuSeconds());
    }

    /** The CPU time so far of this thread and of the common fork-join pool's threads, which parallel streams use. */
    private static long workCpuNanos() {
        long total = THREADS.getCurrentThreadCpuTime();
        for (ThreadInfo thread : THREADS.getThreadInfo(THREADS.getAllThreadIds())) {
            if (thread != null && thread.getThreadName().startsWith("ForkJoinPool.commonPool-worker")) {
                total += Math.max(0, THREADS.getThreadCpuTime(thread.getThreadId()));
            }
        }
        return total;
    }
}
