package dev.changeling.cli;

import dev.changeling.UserError;
import dev.changeling.project.ProjectLayout;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import picocli.CommandLine.Parameters;

/** The project a command works on: the folder named, or the nearest folder upward with a pom.xml. */
final class ProjectOptions {

    @Parameters(arity = "0..*", paramLabel = "PATH",
            description = "The project folder, or files and folders inside it to limit the work to (default: the current folder).")
    List<Path> paths = new ArrayList<>();

    ProjectLayout layout() {
        Path first = paths.isEmpty() ? Path.of("") : paths.get(0);
        Path start = first.toAbsolutePath().normalize();
        if (!Files.exists(start)) {
            throw new UserError(first + ": no such file or folder");
        }
        for (Path at = Files.isDirectory(start) ? start : start.getParent(); at != null; at = at.getParent()) {
            if (Files.isRegularFile(at.resolve("pom.xml"))) {
                return ProjectLayout.maven(at);
            }
        }
        return ProjectLayout.plain(Files.isDirectory(start) ? start : start.getParent());
    }

    /** The paths that limit the work, or none when the whole project is meant. */
    List<Path> limits(ProjectLayout layout) {
        return paths.stream()
                .map(path -> path.toAbsolutePath().normalize())
                .filter(path -> !path.equals(layout.root()))
                .toList();
    }
}
