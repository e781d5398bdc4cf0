package dev.changeling.source;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.function.Predicate;
import java.util.stream.Stream;

/** SHA-256 as lower-case hex: identities of mutants, of the files they were made from, of classpath entries. */
public final class SourceHash {

    private SourceHash() {
    }

    public static String sha256(String text) {
        return sha256(text.getBytes(StandardCharsets.UTF_8));
    }

    /**
     * SHA-256 of what a classpath entry holds: a jar's bytes, or, for a folder, every file {@code counts} accepts (by its
     * path inside the folder, with {@code /}) with its path and bytes; a missing entry is {@code absent}.
     */
    public static String ofEntry(Path entry, Predicate<String> counts) {
        try {
            if (Files.isRegularFile(entry)) {
                return sha256(Files.readAllBytes(entry));
            }
            if (!Files.isDirectory(entry)) {
                return "absent";
            }
            StringBuilder text = new StringBuilder();
            try (Stream<Path> walk = Files.walk(entry)) {
                for (Path file : walk.filter(Files::isRegularFile).sorted().toList()) {
                    String name = entry.relativize(file).toString().replace('\\', '/');
                    if (counts.test(name)) {
                        text.append(name).append(' ').append(sha256(Files.readAllBytes(file))).append('\n');
                    }
                }
            }
            return sha256(text.toString());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** SHA-256 of bytes (a class file's, a jar's) as lower-case hex. */
    public static String sha256(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required by every Java runtime", e);
        }
    }
}
