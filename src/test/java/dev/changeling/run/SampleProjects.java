package dev.changeling.run;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;
import java.util.stream.StreamSupport;

/**
 * The sample projects of {@code samples/}, copied into temporary folders before anything runs on them, so
 * the repository's own tree stays as it is; and fingerprints of a project's files to prove nothing changed.
 */
final class SampleProjects {

    /** Folders never copied, at any depth (a module's own too): build output a local build of a sample may have left. */
    private static final List<String> LEFT_OUT = List.of("target", ".changeling");

    private SampleProjects() {
    }

    /** The folder of a sample in this checkout; surefire runs the tests in the project's own folder. */
    static Path original(String name) {
        Path folder = Path.of(System.getProperty("user.dir"), "samples", name).toAbsolutePath().normalize();
        if (!Files.isRegularFile(folder.resolve("pom.xml"))) {
            throw new IllegalStateException("no sample project at " + folder + "; run the tests from the repository's root");
        }
        return folder;
    }

    /** A fresh copy of a sample at {@code target}, without any build output. */
    static Path copy(String name, Path target) {
        Path from = original(name);
        try (Stream<Path> files = Files.walk(from)) {
            for (Path file : (Iterable<Path>) files::iterator) {
                Path relative = from.relativize(file);
                if (!relative.toString().isEmpty() && StreamSupport.stream(relative.spliterator(), false)
                        .anyMatch(part -> LEFT_OUT.contains(part.toString()))) {
                    continue;
                }
                Path to = target.resolve(relative.toString());
                if (Files.isDirectory(file)) {
                    Files.createDirectories(to);
                } else {
                    Files.copy(file, to);
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return target;
    }

    /** SHA-256 of every file outside {@code target/}, by path relative to the project, folders included as "dir". */
    static Map<String, String> fingerprint(Path project) {
        Map<String, String> hashes = new TreeMap<>();
        try (Stream<Path> files = Files.walk(project)) {
            for (Path file : (Iterable<Path>) files::iterator) {
                Path relative = project.relativize(file);
                if (relative.toString().isEmpty() || relative.getName(0).toString().equals("target")) {
                    continue;
                }
                hashes.put(relative.toString().replace('\\', '/'), Files.isDirectory(file) ? "dir" : sha256(Files.readAllBytes(file)));
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return hashes;
    }

    private static String sha256(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }
}
