package dev.changeling;

import dev.changeling.source.SourceHash;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.CodeSource;

/** Which build of this tool runs: a verdict found by another build is not taken for one of this build's. */
public final class ToolBuild {

    private static String identity;

    private ToolBuild() {
    }

    /** The digest of the jar the tool runs from; for classes in a folder (a development build), the folder. */
    public static synchronized String identity() {
        if (identity == null) {
            identity = find();
        }
        return identity;
    }

    private static String find() {
        CodeSource source = ToolBuild.class.getProtectionDomain().getCodeSource();
        try {
            Path location = Path.of(source.getLocation().toURI());
            return Files.isRegularFile(location) ? SourceHash.sha256(Files.readAllBytes(location)) : "classes in " + location;
        } catch (IOException | java.net.URISyntaxException | RuntimeException e) {
            return "unknown build";
        }
    }
}
