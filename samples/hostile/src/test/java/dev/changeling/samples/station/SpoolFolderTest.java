package dev.changeling.samples.station;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import org.junit.jupiter.api.Test;

/**
 * Hostile to a tool that ends test JVMs abruptly: the spool folder is tidied by {@code deleteOnExit}, which only a
 * JVM that exits normally honours. A JVM killed after this test leaves the folder, and the next {@code mvn test}
 * fails here.
 */
class SpoolFolderTest {

    @Test
    void spoolsIntoAFolderThatGoesWithTheJvm() {
        File spool = new File("target/station-spool");
        assertFalse(spool.exists(), "target/station-spool was left by a test JVM that did not exit normally");
        assertTrue(spool.mkdirs());
        spool.deleteOnExit();
    }
}
