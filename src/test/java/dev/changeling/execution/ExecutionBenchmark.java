package dev.changeling.execution;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;

/**
 * Prints what running mutants costs on the small project of the tests: starting a worker, the baseline,
 * and one job in a warm worker. Not a test. Run it with
 * <pre>
 * mvn -q -o test-compile dependency:build-classpath -Dmdep.outputFile=target/test.cp -Dmdep.includeScope=test
 * java -cp target/classes:target/test-classes:$(cat target/test.cp) dev.changeling.execution.ExecutionBenchmark [jobs]
 * </pre>
 */
public final class ExecutionBenchmark {

    private ExecutionBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        int jobs = args.length > 0 ? Integer.parseInt(args[0]) : 1000;
        Path folder = Files.createTempDirectory("changeling-bench");
        try {
            TinyProject project = TinyProject.create(folder.resolve("shop"));
            SuiteSetup setup = SuiteSetup.of(TinyProject.POINTS, project.testClassNames()).withPreinitialise(List.of("shop.Rates"));
            WorkerSettings settings = WorkerSettings.builder(project.root, project.classpath(), project.root.resolve("target/changeling/bench"))
                    .workers(1).maxHeap("256m").mutantsPerWorker(Integer.MAX_VALUE)
                    .jvmArguments(List.of(System.getProperty("bench.jvm", "-Dbench=1").split(" "))).build();
            String addsZero = "[engine:junit-jupiter]/[class:shop.PricesTest]/[method:addsZero()]";
            String addsTwo = "[engine:junit-jupiter]/[class:shop.PricesTest]/[method:addsTwoNumbers()]";

            List<Long> starts = new ArrayList<>();
            List<Long> firstJobs = new ArrayList<>();
            for (int i = 0; i < 5; i++) {
                try (WorkerPool pool = WorkerPool.open(settings, setup)) {
                    long start = System.nanoTime();
                    JobResult first = pool.run(List.of(MutantJob.schema("first", new int[] {0}, List.of(addsZero), 60_000)), result -> { }).get(0);
                    starts.add(System.nanoTime() - start);
                    firstJobs.add(first.nanos());
                }
            }
            print("fresh worker: start, prepare and first single-test job (median of 5)", median(starts));
            print("fresh worker: the first single-test job alone, as its deadline sees it", median(firstJobs));

            try (WorkerPool pool = WorkerPool.open(settings, setup)) {
                long start = System.nanoTime();
                Baseline baseline = pool.baseline(name -> { });
                print("baseline of " + baseline.tests().size() + " tests, worker start included", System.nanoTime() - start);

                measure(pool, "warm worker, one passing test per job (survived)", jobs, List.of(addsZero), 0);
                measure(pool, "warm worker, one failing test per job (killed)", jobs, List.of(addsTwo), 0);
                List<String> ten = new ArrayList<>();
                for (int i = 0; i < 10; i++) {
                    ten.add(addsZero);
                }
                measure(pool, "warm worker, ten passing tests per job", jobs / 10, ten, 0);
            }

            try (WorkerPool pool = WorkerPool.open(settings.toBuilder().workers(2).build(), setup)) {
                List<MutantJob> batch = new ArrayList<>();
                for (int i = 0; i < jobs; i++) {
                    batch.add(MutantJob.schema("m" + i, new int[] {0}, List.of(addsZero), 60_000));
                }
                pool.run(batch.subList(0, 100), result -> { });
                long start = System.nanoTime();
                pool.run(batch, result -> { });
                print("two workers, one passing test per job: wall time per job", (System.nanoTime() - start) / jobs);
            }
        } finally {
            try (Stream<Path> walk = Files.walk(folder)) {
                walk.sorted(Comparator.reverseOrder()).forEach(path -> path.toFile().delete());
            }
        }
    }

    private static void measure(WorkerPool pool, String what, int count, List<String> tests, int point) {
        List<MutantJob> batch = new ArrayList<>();
        for (int i = 0; i < count; i++) {
            batch.add(MutantJob.schema("m" + i, new int[] {point}, tests, 60_000));
        }
        pool.run(batch.subList(0, Math.min(100, count)), result -> { });
        long workerCpu = workerCpuNanos();
        long toolCpu = toolCpuNanos();
        long start = System.nanoTime();
        List<JobResult> results = pool.run(batch, result -> { });
        long wall = (System.nanoTime() - start) / count;
        long inWorker = results.stream().mapToLong(result -> result.testsRun().stream().mapToLong(TestRun::nanos).sum()).sum() / count;
        print(what + ": wall per job", wall);
        print(what + ": wall in the worker's test runs per job", inWorker);
        print(what + ": worker CPU per job", (workerCpuNanos() - workerCpu) / count);
        print(what + ": tool CPU per job", (toolCpuNanos() - toolCpu) / count);
    }

    /** CPU time is what a job costs; wall time on a shared machine also holds the wait for a free core. */
    private static long workerCpuNanos() {
        return ProcessHandle.current().children()
                .filter(child -> child.info().arguments().map(List::of).orElse(List.of()).contains(WorkerClasses.MAIN_CLASS))
                .mapToLong(ExecutionBenchmark::cpuNanos)
                .sum();
    }

    /** From /proc on Linux (user and system clock ticks, fields 14 and 15), else what the JDK says. */
    private static long cpuNanos(ProcessHandle process) {
        try {
            String stat = Files.readString(Path.of("/proc/" + process.pid() + "/stat"));
            String[] fields = stat.substring(stat.lastIndexOf(')') + 2).split(" ");
            return (Long.parseLong(fields[11]) + Long.parseLong(fields[12])) * 10_000_000L;
        } catch (java.io.IOException | RuntimeException e) {
            return process.info().totalCpuDuration().map(java.time.Duration::toNanos).orElse(0L);
        }
    }

    private static long toolCpuNanos() {
        return ((com.sun.management.OperatingSystemMXBean) java.lang.management.ManagementFactory.getOperatingSystemMXBean())
                .getProcessCpuTime();
    }

    private static long median(List<Long> values) {
        List<Long> sorted = values.stream().sorted().toList();
        return sorted.get(sorted.size() / 2);
    }

    private static void print(String what, long nanos) {
        System.out.printf(Locale.ROOT, "%-75s %9.3f ms%n", what, nanos / 1e6);
    }
}
