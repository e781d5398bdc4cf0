package dev.changeling.execution;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * A stand-in for the tool, run as its own JVM by the tests: opens a pool, runs one job so that an idle
 * worker is alive, prints that worker's pid, then either exits without closing the pool ({@code exit})
 * or waits to be killed ({@code wait}).
 */
public final class PoolHolder {

    private PoolHolder() {
    }

    /** {@code PoolHolder <exit|wait> <project dir> <test classes> <work dir> <test id> <classpath entry>...} */
    public static void main(String[] args) throws Exception {
        List<Path> classpath = new ArrayList<>();
        for (int i = 5; i < args.length; i++) {
            classpath.add(Path.of(args[i]));
        }
        WorkerSettings settings = WorkerSettings.builder(Path.of(args[1]), classpath, Path.of(args[3])).workers(1).maxHeap("96m").build();
        WorkerPool pool = WorkerPool.open(settings, SuiteSetup.of(TinyProject.POINTS, TinyProject.defaultTestClasses(Path.of(args[2]))));
        pool.run(List.of(MutantJob.schema("warm", new int[0], List.of(args[4]), 60_000)), result -> { });
        ProcessHandle worker = ProcessHandle.current().children()
                .filter(child -> child.info().arguments().map(List::of).orElse(List.of()).contains(WorkerClasses.MAIN_CLASS))
                .findFirst().orElseThrow();
        System.out.println(worker.pid());
        System.out.flush();
        if (args[0].equals("exit")) {
            System.exit(0);
        }
        Thread.currentThread().join();
    }
}
