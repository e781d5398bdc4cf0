package dev.changeling.cli;

import dev.changeling.project.ProjectLayout;
import dev.changeling.terminal.Style;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;

/**
 * What every command that works on a project takes: the project (a folder, or files and folders inside it)
 * as positional paths, and the output options.
 */
final class ProjectOptions {

    @Parameters(arity = "0..*", paramLabel = "PATH",
            description = "The project folder, or files and folders inside it to limit the work to (default: the current folder).")
    List<Path> paths = new ArrayList<>();

    @Mixin
    OutputOptions output = new OutputOptions();

    /** The project's layout as every command works it out ({@link ProjectLayout#locate}). */
    ProjectLayout layout() {
        return ProjectLayout.locate(paths, Optional.empty());
    }

    /** The paths that limit the work, or none when the whole project is meant. */
    List<Path> limits(ProjectLayout layout) {
        return layout.limits(paths);
    }

    Style style() {
        return output.style();
    }

    boolean plain() {
        return output.plain;
    }
}
