package dev.changeling.project;

import dev.changeling.UserError;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Makes a test classpath runnable by a JUnit Platform launcher of exactly the version of its
 * {@code junit-platform-engine}, adding the engines a build tool would add when a project declares none.
 */
final class JUnitAlignment {

    /**
     * For a project with JUnit 4 tests only: the last 5.x line. It runs on Java 8 and later, needs JUnit 4.12 or
     * newer, and is not yet deprecated (from 6.0 the vintage engine reports a deprecation notice on every discovery).
     */
    static final String VINTAGE_FOR_JUNIT4 = "5.14.4";
    static final String PLATFORM_FOR_JUNIT4 = "1.14.4";

    private static final String PLATFORM = "org.junit.platform:";
    private static final String LAUNCHER = "junit-platform-launcher";

    /** The classpath ready for workers, the platform version its launcher has, and what was done to get there. */
    record Aligned(List<Path> classpath, String platformVersion, String description) {
    }

    private JUnitAlignment() {
    }

    static Aligned align(List<Path> classpath, ArtifactResolver resolver, Path project) {
        Optional<JarName> engine = first(classpath, "junit-platform-engine");
        if (engine.isPresent()) {
            return withLauncherOf(engine.get().version(), classpath, resolver);
        }
        Optional<JarName> jupiter = first(classpath, "junit-jupiter-api");
        Optional<JarName> junit4 = first(classpath, "junit").filter(name -> name.version().startsWith("3.") || name.version().startsWith("4."));
        if (jupiter.isEmpty() && junit4.isEmpty()) {
            throw new UserError(project + ": no JUnit on the test classpath (looked for junit-platform-engine, junit-jupiter-api"
                    + " and junit:junit); changeling runs JUnit 4 and JUnit Platform tests, so add one of them to the test dependencies");
        }
        boolean vintageUsable = junit4.isPresent() && junit4.get().atLeast(4, 12);
        if (jupiter.isEmpty() && !vintageUsable) {
            throw new UserError(project + ": the tests use JUnit " + junit4.get().version()
                    + ", which the JUnit Platform cannot run; raise junit:junit to 4.12 or newer in the test dependencies");
        }
        List<String> added = new ArrayList<>();
        String platform;
        if (jupiter.isPresent()) {
            String version = jupiter.get().version();
            platform = platformOf(version);
            added.add("org.junit.jupiter:junit-jupiter-engine:" + version);
            if (vintageUsable) {
                added.add("org.junit.vintage:junit-vintage-engine:" + version);
            }
        } else {
            platform = PLATFORM_FOR_JUNIT4;
            added.add("org.junit.vintage:junit-vintage-engine:" + VINTAGE_FOR_JUNIT4);
        }
        added.add(PLATFORM + LAUNCHER + ":" + platform);
        List<Path> merged = merged(classpath, resolver.resolve(added));
        return new Aligned(merged, platform, "added " + String.join(", ", added.stream().map(JUnitAlignment::shortName).toList())
                + " (the project declares no test engine)");
    }

    private static Aligned withLauncherOf(String version, List<Path> classpath, ArtifactResolver resolver) {
        Optional<JarName> launcher = first(classpath, LAUNCHER);
        if (launcher.isPresent() && launcher.get().version().equals(version)) {
            return new Aligned(List.copyOf(classpath), version, "the project's own " + LAUNCHER + " " + version);
        }
        List<Path> merged = merged(classpath, resolver.resolve(List.of(PLATFORM + LAUNCHER + ":" + version)));
        String description = launcher.isEmpty()
                ? "added " + LAUNCHER + " " + version + " (the project has none)"
                : "replaced " + LAUNCHER + " " + launcher.get().version() + " by " + version + " to match junit-platform-engine " + version;
        return new Aligned(merged, version, description);
    }

    /** Jupiter 5.N.x runs on Platform 1.N.x; from 6.0 both share one version number. */
    static String platformOf(String jupiterVersion) {
        return jupiterVersion.startsWith("5.") ? "1." + jupiterVersion.substring(2) : jupiterVersion;
    }

    /**
     * The classpath with each resolved jar added at the end, unless the project has that artifact already; a
     * Platform artifact of another version is replaced where it stands, so the order of the rest is kept.
     */
    private static List<Path> merged(List<Path> classpath, List<Path> resolved) {
        List<Path> result = new ArrayList<>(classpath);
        for (Path jar : resolved) {
            Optional<JarName> name = JarName.of(jar);
            int present = name.map(found -> indexOf(result, found.artifact())).orElse(result.indexOf(jar));
            if (present < 0) {
                result.add(jar);
            } else if (name.isPresent() && name.get().artifact().startsWith("junit-platform-")
                    && !JarName.of(result.get(present)).map(JarName::version).orElse("").equals(name.get().version())) {
                result.set(present, jar);
            }
        }
        return List.copyOf(result);
    }

    private static int indexOf(List<Path> classpath, String artifact) {
        for (int index = 0; index < classpath.size(); index++) {
            if (JarName.of(classpath.get(index)).map(JarName::artifact).orElse("").equals(artifact)) {
                return index;
            }
        }
        return -1;
    }

    private static Optional<JarName> first(List<Path> classpath, String artifact) {
        return classpath.stream().map(JarName::of).flatMap(Optional::stream).filter(name -> name.artifact().equals(artifact)).findFirst();
    }

    private static String shortName(String coordinates) {
        return coordinates.substring(coordinates.indexOf(':') + 1).replace(':', ' ');
    }
}
