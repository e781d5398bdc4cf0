package dev.changeling;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.util.UUID;
import java.nio.file.StandardCopyOption;

/** Writes a file so that a reader sees the old content or the new, never half of one: temp file, then rename. */
public final class AtomicFiles {

    /** Writes the content of a file to a stream. */
    @FunctionalInterface
    public interface Content {
        void writeTo(OutputStream out) throws IOException;
    }

    private AtomicFiles() {
    }

    /**
     * Writes the file. The new file gets the permissions an ordinary write would give: those of the file it
     * replaces, or for a new file what the process's umask leaves of read and write for all.
     */
    public static void write(Path file, Content content) throws IOException {
        Path parent = file.toAbsolutePath().getParent();
        Files.createDirectories(parent);
        Path temporary = parent.resolve("." + file.getFileName() + "-" + UUID.randomUUID() + ".tmp");
        try {
            try (OutputStream out = Files.newOutputStream(temporary, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE)) {
                content.writeTo(out);
            }
            keepPermissions(file, temporary);
            try {
                Files.move(temporary, file, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temporary, file, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(temporary);
        }
    }

    private static void keepPermissions(Path file, Path temporary) throws IOException {
        if (Files.exists(file) && Files.getFileStore(temporary).supportsFileAttributeView(PosixFileAttributeView.class)) {
            Files.setPosixFilePermissions(temporary, Files.getPosixFilePermissions(file));
        }
    }

    public static void writeString(Path file, String text) throws IOException {
        write(file, out -> out.write(text.getBytes(StandardCharsets.UTF_8)));
    }
}
