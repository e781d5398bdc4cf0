package dev.changeling.support;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.stream.Stream;

/** Copies a bundled sample project into a temporary folder, leaving out any build output. */
public final class SampleCopy {

    private SampleCopy() {
    }

    /** The folder of {@code samples/<name>} in this repository (tests run from the repository root). */
    public static Path original(String name) {
        Path folder = Path.of("samples", name).toAbsolutePath().normalize();
        if (!Files.isDirectory(folder)) {
            throw new IllegalStateException("no sample " + folder);
        }
        return folder;
    }

    public static Path of(String name, Path into) {
        Path from = original(name);
        Path to = into.resolve(name);
        try (Stream<Path> walk = Files.walk(from)) {
            for (Path source : walk.filter(path -> !from.relativize(path).startsWith("target")).toList()) {
                Path target = to.resolve(from.relativize(source).toString());
                if (Files.isDirectory(source)) {
                    Files.createDirectories(target);
                } else {
                    Files.copy(source, target, StandardCopyOption.COPY_ATTRIBUTES);
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return to;
    }
}
