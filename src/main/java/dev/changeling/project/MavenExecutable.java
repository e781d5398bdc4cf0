package dev.changeling.project;

import dev.changeling.UserError;
import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** Finds the {@code mvn} to run: the one the user named, else MAVEN_HOME's, else the first on PATH. */
final class MavenExecutable {

    private MavenExecutable() {
    }

    static Path find(Optional<Path> named, Map<String, String> environment) {
        if (named.isPresent()) {
            Path given = named.get().toAbsolutePath().normalize();
            if (!Files.isRegularFile(given) || !Files.isExecutable(given)) {
                throw new UserError(named.get() + ": no such executable; give the path of the mvn program");
            }
            return given;
        }
        List<String> names = isWindows() ? List.of("mvn.cmd", "mvn.bat", "mvn") : List.of("mvn");
        String home = environment.get("MAVEN_HOME");
        if (home != null && !home.isBlank()) {
            Optional<Path> inHome = firstExecutable(Path.of(home, "bin"), names);
            if (inHome.isPresent()) {
                return inHome.get();
            }
        }
        String path = environment.getOrDefault("PATH", "");
        for (String folder : path.split(File.pathSeparator)) {
            if (!folder.isBlank()) {
                Optional<Path> onPath = firstExecutable(Path.of(folder), names);
                if (onPath.isPresent()) {
                    return onPath.get();
                }
            }
        }
        throw new UserError("mvn not found on PATH" + (home == null ? "" : " nor in MAVEN_HOME=" + home)
                + "; install Maven 3.6.1 or newer, or name the mvn program to use");
    }

    private static Optional<Path> firstExecutable(Path folder, List<String> names) {
        return names.stream()
                .map(folder::resolve)
                .filter(candidate -> Files.isRegularFile(candidate) && Files.isExecutable(candidate))
                .map(candidate -> candidate.toAbsolutePath().normalize())
                .findFirst();
    }

    private static boolean isWindows() {
        return System.getProperty("os.name", "").toLowerCase(java.util.Locale.ROOT).startsWith("windows");
    }
}
