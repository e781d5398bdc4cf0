package dev.changeling.samples.station;

import java.util.concurrent.BlockingQueue;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.atomic.AtomicInteger;

/** Sends batches of readings from a queue on a thread of its own, and stops after the batches it was told of. */
public final class Uploader {

    private final BlockingQueue<String> batches = new LinkedBlockingQueue<>();
    private final AtomicInteger sent = new AtomicInteger();
    private final Thread thread;

    public Uploader(int expectedBatches) {
        thread = new Thread(() -> send(expectedBatches), "uploader");
    }

    public void start() {
        thread.start();
    }

    public void offer(String batch) {
        batches.add(batch);
    }

    /** Waits until the uploader has sent everything it was told of. */
    public void awaitDone() throws InterruptedException {
        thread.join();
    }

    public int sent() {
        return sent.get();
    }

    private void send(int expectedBatches) {
        try {
            // Hostile: the mutant `<` -> `<=` waits for one batch more than will ever come, and `count++` ->
            // `count--` never reaches the end: the thread blocks for good and awaitDone() with it.
            for (int count = 0; count < expectedBatches; count++) {
                batches.take();
                sent.incrementAndGet();
            }
        } catch (InterruptedException stopped) {
            Thread.currentThread().interrupt();
        }
    }
}
