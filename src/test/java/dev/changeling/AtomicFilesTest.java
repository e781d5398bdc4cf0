package dev.changeling;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** An atomic write leaves a file as an ordinary write would, in content and in permissions. */
class AtomicFilesTest {

    @TempDir
    Path folder;

    @Test
    void aNewFile_getsThePermissionsOfAnOrdinaryWrite_notOwnerOnly() throws IOException {
        Path ordinary = Files.writeString(folder.resolve("ordinary.txt"), "x");
        Path atomic = folder.resolve("atomic.txt");

        AtomicFiles.writeString(atomic, "x");

        assertEquals(Files.getPosixFilePermissions(ordinary), Files.getPosixFilePermissions(atomic));
    }

    @Test
    void aReplacedFile_keepsItsPermissions() throws IOException {
        Path file = Files.writeString(folder.resolve("shared.txt"), "old");
        Files.setPosixFilePermissions(file, PosixFilePermissions.fromString("rw-r-----"));

        AtomicFiles.writeString(file, "new");

        assertEquals("new", Files.readString(file));
        assertEquals(PosixFilePermissions.fromString("rw-r-----"), Files.getPosixFilePermissions(file));
    }

    @Test
    void nothingIsLeftBesideTheFile() throws IOException {
        AtomicFiles.writeString(folder.resolve("one.txt"), "1");
        try (var entries = Files.list(folder)) {
            assertEquals(1, entries.count());
        }
    }
}
