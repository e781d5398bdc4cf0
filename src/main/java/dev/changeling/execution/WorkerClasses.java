package dev.changeling.execution;

import dev.changeling.worker.WorkerMain;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;

/**
 * Copies the worker and probe classes out of the tool's own code (its jar, or its classes folder when
 * run from a build) into a folder of their own, so a worker's classpath holds them and none of the
 * tool's other dependencies.
 */
public final class WorkerClasses {

    static final List<String> PACKAGES = List.of("dev/changeling/worker/", "dev/changeling/probe/");
    static final String MAIN_CLASS = WorkerMain.class.getName();

    private WorkerClasses() {
    }

    /** Fills {@code directory} (emptied first) with the worker and probe classes of the running tool. */
    public static Path extract(Path directory) {
        try {
            return extract(Path.of(WorkerMain.class.getProtectionDomain().getCodeSource().getLocation().toURI()), directory);
        } catch (URISyntaxException e) {
            throw new IllegalStateException("cannot locate the tool's own classes", e);
        }
    }

    /** Fills {@code directory} (emptied first) with the worker and probe classes found in a jar or classes folder. */
    static Path extract(Path codeSource, Path folder) {
        Path directory = folder.toAbsolutePath().normalize();
        try {
            deleteContents(directory);
            Files.createDirectories(directory);
            if (Files.isDirectory(codeSource)) {
                copyFromFolder(codeSource, directory);
            } else {
                copyFromJar(codeSource, directory);
            }
            if (!Files.isRegularFile(directory.resolve(MAIN_CLASS.replace('.', '/') + ".class"))) {
                throw new IllegalStateException("no worker classes in " + codeSource);
            }
            return directory;
        } catch (IOException e) {
            throw new UncheckedIOException("cannot copy the worker classes into " + directory, e);
        }
    }

    private static void copyFromFolder(Path root, Path directory) throws IOException {
        for (String folder : PACKAGES) {
            Path source = root.resolve(folder);
            if (!Files.isDirectory(source)) {
                continue;
            }
            try (Stream<Path> files = Files.walk(source)) {
                for (Path file : files.filter(path -> path.toString().endsWith(".class")).toList()) {
                    Path target = directory.resolve(root.relativize(file).toString());
                    Files.createDirectories(target.getParent());
                    Files.copy(file, target, StandardCopyOption.REPLACE_EXISTING);
                }
            }
        }
    }

    private static void copyFromJar(Path jar, Path directory) throws IOException {
        try (InputStream file = Files.newInputStream(jar); ZipInputStream zip = new ZipInputStream(file)) {
            for (ZipEntry entry = zip.getNextEntry(); entry != null; entry = zip.getNextEntry()) {
                String name = entry.getName();
                if (entry.isDirectory() || !name.endsWith(".class") || PACKAGES.stream().noneMatch(name::startsWith)) {
                    continue;
                }
                Path target = directory.resolve(name).normalize();
                if (!target.startsWith(directory)) {
                    continue;
                }
                Files.createDirectories(target.getParent());
                Files.copy(zip, target, StandardCopyOption.REPLACE_EXISTING);
            }
        }
    }

    static void deleteContents(Path directory) throws IOException {
        if (!Files.isDirectory(directory)) {
            return;
        }
        try (Stream<Path> walk = Files.walk(directory)) {
            for (Path path : walk.sorted(Comparator.reverseOrder()).toList()) {
                if (!path.equals(directory)) {
                    Files.deleteIfExists(path);
                }
            }
        }
    }
}
