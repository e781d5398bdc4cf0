package dev.changeling.execution;

import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;

/**
 * Makes sure no worker JVM outlives the tool, whichever way the tool ends: on shutdown it first stops
 * the pools (so their running jobs are not mistaken for crashes, and their workers exit as test JVMs do), then
 * kills any worker still alive.
 */
final class Reaper {

    private static final Set<DefaultWorkerPool> POOLS = ConcurrentHashMap.newKeySet();
    private static final Set<WorkerProcess> WORKERS = ConcurrentHashMap.newKeySet();
    private static boolean hooked;

    private Reaper() {
    }

    static void watch(DefaultWorkerPool pool) {
        hook();
        POOLS.add(pool);
    }

    static void forget(DefaultWorkerPool pool) {
        POOLS.remove(pool);
    }

    static void watch(WorkerProcess worker) {
        hook();
        WORKERS.add(worker);
    }

    static void forget(WorkerProcess worker) {
        WORKERS.remove(worker);
    }

    private static synchronized void hook() {
        if (!hooked) {
            try {
                Runtime.getRuntime().addShutdownHook(new Thread(Reaper::reap, "changeling-worker-reaper"));
            } catch (IllegalStateException shuttingDown) {
                // too late for a hook; whoever is shutting down kills the pools it knows
            }
            hooked = true;
        }
    }

    private static void reap() {
        POOLS.forEach(DefaultWorkerPool::stop);
        WORKERS.forEach(WorkerProcess::kill);
    }
}
