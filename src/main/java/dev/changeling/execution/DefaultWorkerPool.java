package dev.changeling.execution;

import dev.changeling.worker.UniqueIds;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CancellationException;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.Consumer;
import java.util.function.Predicate;
import java.util.stream.Collectors;

/** The worker pool: one thread per slot takes the next job from a shared list until none are left. */
final class DefaultWorkerPool implements WorkerPool {

    private final WorkerSettings settings;
    private final SuiteSetup setup;
    private final Path workerClasses;
    private final WorkerSlot[] slots;
    private final AtomicInteger started = new AtomicInteger();
    private final WorkerTime workerTime = new WorkerTime();
    private volatile Baseline lastBaseline;
    private final Object listenerLock = new Object();
    private volatile boolean stopped;

    DefaultWorkerPool(WorkerSettings settings, SuiteSetup setup) {
        this.settings = settings;
        this.setup = setup;
        this.workerClasses = WorkerClasses.extract(settings.workDirectory().resolve("classes"));
        this.slots = new WorkerSlot[settings.workers()];
        for (int i = 0; i < slots.length; i++) {
            slots[i] = new WorkerSlot(this, i + 1);
        }
        Reaper.watch(this);
    }

    /**
     * Every worker takes the next test class until none is left, each class one request (as the build's own
     * runner does when it reads classes lazily); a class goes together with its nested classes, which the engine
     * would otherwise find and run twice. Where the build gives every class a fresh JVM, a class that fails in a
     * shared worker runs again in a fresh one, and that run counts.
     */
    @Override
    public synchronized Baseline baseline(Predicate<String> runs, Consumer<String> onTestFinished) {
        throwIfStopped();
        long start = System.nanoTime();
        List<List<String>> classes = new ArrayList<>(setup.testClasses().stream()
                .collect(Collectors.groupingBy(name -> name.contains("$") ? name.substring(0, name.indexOf('$')) : name,
                        LinkedHashMap::new, Collectors.toList()))
                .entrySet().stream().filter(group -> runs.test(group.getKey())).map(Map.Entry::getValue).toList());
        Baseline[] parts = new Baseline[classes.size()];
        AtomicInteger next = new AtomicInteger();
        Consumer<String> progress = name -> {
            synchronized (listenerLock) {
                onTestFinished.accept(name);
            }
        };
        onSlots(classes.size(), slot -> {
            for (int index = next.getAndIncrement(); index < classes.size() && !stopped; index = next.getAndIncrement()) {
                parts[index] = slot.baseline(classes.get(index), false, progress);
            }
        });
        throwIfStopped();
        List<String> fresh = new ArrayList<>();
        if (setup.freshJvmPerClass()) {
            for (int index = 0; index < parts.length; index++) {
                if (!parts[index].green()) {
                    parts[index] = slots[0].baseline(classes.get(index), true, progress);
                    fresh.add(classes.get(index).get(0));
                }
            }
        }
        lastBaseline = Baseline.merge(List.of(parts), System.nanoTime() - start, fresh);
        return lastBaseline;
    }

    @Override
    public synchronized List<JobResult> run(List<MutantJob> jobs, Consumer<JobResult> onResult) {
        for (MutantJob job : jobs) {
            for (int point : job.points()) {
                if (point < 0 || point >= setup.pointCount()) {
                    throw new IllegalArgumentException(job.key() + " switches on point " + point + ", outside 0.." + (setup.pointCount() - 1));
                }
            }
        }
        JobResult[] results = new JobResult[jobs.size()];
        AtomicInteger next = new AtomicInteger();
        RecentKillers recent = new RecentKillers();
        onSlots(jobs.size(), slot -> work(slot, jobs, next, recent, results, onResult));
        List<JobResult> finished = new ArrayList<>();
        for (JobResult result : results) {
            if (result != null) {
                finished.add(result);
            }
        }
        return finished;
    }

    private void work(WorkerSlot slot, List<MutantJob> jobs, AtomicInteger next, RecentKillers recent, JobResult[] results,
                      Consumer<JobResult> onResult) {
        for (int index = next.getAndIncrement(); index < jobs.size() && !stopped; index = next.getAndIncrement()) {
            JobResult result = slot.execute(recent.first(jobs.get(index)));
            recent.note(result);
            boolean lostToStop = stopped && (result.outcome() == Outcome.CRASHED || result.outcome() == Outcome.TIMED_OUT);
            if (lostToStop) {
                return;
            }
            results[index] = result;
            synchronized (listenerLock) {
                onResult.accept(result);
            }
        }
    }

    /**
     * Runs the body on as many slots as there are tasks (all at most), one thread each, and waits for them. The
     * first failure stops the pool and is thrown once every thread has ended; a stop meanwhile just ends them.
     */
    private void onSlots(int tasks, Consumer<WorkerSlot> body) {
        AtomicReference<RuntimeException> failure = new AtomicReference<>();
        List<Thread> threads = new ArrayList<>();
        for (int i = 0; i < Math.min(slots.length, tasks) && !stopped; i++) {
            WorkerSlot slot = slots[i];
            Thread thread = new Thread(() -> {
                try {
                    body.accept(slot);
                } catch (CancellationException stoppedMeanwhile) {
                    // the pool was stopped; what finished is kept
                } catch (RuntimeException e) {
                    if (!stopped && failure.compareAndSet(null, e)) {
                        stop();
                    }
                }
            }, "changeling-worker-slot-" + (i + 1));
            thread.setDaemon(true);
            threads.add(thread);
            thread.start();
        }
        for (Thread thread : threads) {
            joinStoppingOnInterrupt(thread);
        }
        if (failure.get() != null) {
            throw failure.get();
        }
    }

    /** Every worker is asked to exit first, then each is waited for, so they share one grace period. */
    @Override
    public void stop() {
        stopped = true;
        for (WorkerSlot slot : slots) {
            slot.askToStop();
        }
        for (WorkerSlot slot : slots) {
            slot.awaitStop();
        }
    }

    @Override
    public boolean stopped() {
        return stopped;
    }

    @Override
    public int workersStarted() {
        return started.get();
    }

    @Override
    public WorkerTime workerTime() {
        return workerTime;
    }

    @Override
    public synchronized void close() {
        for (WorkerSlot slot : slots) {
            slot.close();
        }
        Reaper.forget(this);
    }

    /** What the tests within these containers (test classes, say) took in this pool's baseline; unknown counts as none. */
    long baselineNanosWithin(List<String> containers) {
        Baseline baseline = lastBaseline;
        if (baseline == null) {
            return 0;
        }
        return baseline.tests().stream()
                .filter(test -> containers.stream().anyMatch(container -> UniqueIds.isWithin(test.id(), container)))
                .mapToLong(RecordedTest::nanos)
                .sum();
    }

    WorkerSettings settings() {
        return settings;
    }

    SuiteSetup setup() {
        return setup;
    }

    Path workerClasses() {
        return workerClasses;
    }

    void counted() {
        started.incrementAndGet();
    }

    void throwIfStopped() {
        if (stopped) {
            throw new CancellationException("the worker pool was stopped");
        }
    }

    /** An interrupt of the caller means "stop": the workers are ended, and the threads are still waited for. */
    private void joinStoppingOnInterrupt(Thread thread) {
        boolean interrupted = false;
        while (true) {
            try {
                thread.join();
                break;
            } catch (InterruptedException e) {
                interrupted = true;
                stop();
            }
        }
        if (interrupted) {
            Thread.currentThread().interrupt();
        }
    }
}
