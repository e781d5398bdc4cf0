package dev.changeling.project;

import java.nio.file.Path;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The artifact id and version of a jar on a classpath, read from where it lies in a Maven repository
 * ({@code .../artifact/version/artifact-version.jar}) or else from its file name.
 */
record JarName(String artifact, String version) {

    private static final Pattern FILE_NAME = Pattern.compile("(.+?)-(\\d+(?:\\.\\d+)*(?:[-.][A-Za-z0-9]+)*)\\.jar");

    static Optional<JarName> of(Path entry) {
        Path fileName = entry.getFileName();
        if (fileName == null || !fileName.toString().endsWith(".jar")) {
            return Optional.empty();
        }
        String name = fileName.toString();
        Path versionFolder = entry.getParent();
        Path artifactFolder = versionFolder == null ? null : versionFolder.getParent();
        if (artifactFolder != null && artifactFolder.getFileName() != null) {
            String artifact = artifactFolder.getFileName().toString();
            String version = versionFolder.getFileName().toString();
            String stem = artifact + "-" + version;
            if (name.equals(stem + ".jar") || name.startsWith(stem + "-")) {
                return Optional.of(new JarName(artifact, version));
            }
        }
        Matcher matcher = FILE_NAME.matcher(name);
        return matcher.matches() ? Optional.of(new JarName(matcher.group(1), matcher.group(2))) : Optional.empty();
    }

    /** Whether this version is at least {@code major.minor}; a version that does not start with numbers is not. */
    boolean atLeast(int major, int minor) {
        Matcher numbers = Pattern.compile("(\\d+)(?:\\.(\\d+))?").matcher(version);
        if (!numbers.lookingAt()) {
            return false;
        }
        int foundMajor = Integer.parseInt(numbers.group(1));
        int foundMinor = numbers.group(2) == null ? 0 : Integer.parseInt(numbers.group(2));
        return foundMajor > major || foundMajor == major && foundMinor >= minor;
    }
}
