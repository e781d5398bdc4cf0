package dev.changeling.project;

import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * How to find a project's classes and test classpath.
 *
 * @param mavenExecutable the mvn to run; empty means MAVEN_HOME's, else the first on PATH
 * @param mavenArguments  extra arguments for every mvn call (a settings file, a profile, {@code -o})
 * @param explicitProject the folders and classpath given by hand, for a project Maven does not build; then
 *                        mvn runs only if the JUnit launcher has to be fetched
 */
public record DiscoveryOptions(Optional<Path> mavenExecutable, List<String> mavenArguments, Optional<ExplicitProject> explicitProject) {

    public DiscoveryOptions {
        Objects.requireNonNull(mavenExecutable, "mavenExecutable");
        mavenArguments = List.copyOf(mavenArguments);
        Objects.requireNonNull(explicitProject, "explicitProject");
    }

    public static DiscoveryOptions defaults() {
        return new DiscoveryOptions(Optional.empty(), List.of(), Optional.empty());
    }

    public DiscoveryOptions withMavenExecutable(Path mvn) {
        return new DiscoveryOptions(Optional.of(mvn), mavenArguments, explicitProject);
    }

    public DiscoveryOptions withMavenArguments(List<String> arguments) {
        return new DiscoveryOptions(mavenExecutable, arguments, explicitProject);
    }

    public DiscoveryOptions withExplicitProject(ExplicitProject project) {
        return new DiscoveryOptions(mavenExecutable, mavenArguments, Optional.of(project));
    }
}
