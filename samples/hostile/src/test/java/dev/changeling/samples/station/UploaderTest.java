package dev.changeling.samples.station;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class UploaderTest {

    @Test
    void sendsEveryBatchItWasToldOfAndStops() throws InterruptedException {
        Uploader uploader = new Uploader(3);
        uploader.start();
        uploader.offer("00:00-00:15");
        uploader.offer("00:15-00:30");
        uploader.offer("00:30-00:45");

        uploader.awaitDone();

        assertEquals(3, uploader.sent());
    }
}
