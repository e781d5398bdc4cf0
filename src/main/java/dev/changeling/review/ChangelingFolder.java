package dev.changeling.review;

import dev.changeling.AtomicFiles;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * The project's {@code .changeling/} folder: the committed equivalents list, and {@code local/} for
 * state that stays on one machine. Made with the git settings those two need.
 */
final class ChangelingFolder {

    static final String NAME = ".changeling";
    static final String LOCAL = "local";

    private ChangelingFolder() {
    }

    static Path of(Path projectRoot) {
        return projectRoot.resolve(NAME);
    }

    /**
     * Makes the folder when it is missing, with a {@code .gitignore} that keeps {@code local/} out of
     * commits and a {@code .gitattributes} that merges the equivalents list by keeping the lines of
     * both sides, so two branches that each add entries never conflict.
     */
    static Path ensure(Path projectRoot) throws IOException {
        Path folder = of(projectRoot);
        if (Files.isDirectory(folder)) {
            return folder;
        }
        Files.createDirectories(folder);
        AtomicFiles.writeString(folder.resolve(".gitignore"), LOCAL + "/\n");
        AtomicFiles.writeString(folder.resolve(".gitattributes"), EquivalentsList.FILE_NAME + " merge=union\n");
        return folder;
    }

    /**
     * Makes {@code local/}; where the folder was made by hand without a {@code .gitignore}, adds one
     * first, so that machine-local state is not committed by accident.
     */
    static Path ensureLocal(Path projectRoot) throws IOException {
        Path folder = ensure(projectRoot);
        Path ignore = folder.resolve(".gitignore");
        if (!Files.exists(ignore)) {
            AtomicFiles.writeString(ignore, LOCAL + "/\n");
        }
        return Files.createDirectories(folder.resolve(LOCAL));
    }
}
