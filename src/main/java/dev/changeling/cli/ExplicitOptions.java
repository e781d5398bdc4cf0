package dev.changeling.cli;

import dev.changeling.ExitCode;
import dev.changeling.UserError;
import dev.changeling.project.ExplicitProject;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import picocli.CommandLine.Option;

/** For a project that Maven does not build: its folders and classpath named by hand. */
final class ExplicitOptions {

    @Option(names = "--source-root", paramLabel = "DIR", description = "Main source folder, for a project Maven does not build (repeatable).")
    List<Path> sourceRoots = new ArrayList<>();

    @Option(names = "--test-source-root", paramLabel = "DIR", description = "Test source folder, for a project Maven does not build (repeatable).")
    List<Path> testSourceRoots = new ArrayList<>();

    @Option(names = "--classes", paramLabel = "DIR", description = "The compiled main classes, for a project Maven does not build.")
    Path classes;

    @Option(names = "--test-classes", paramLabel = "DIR", description = "The compiled test classes, for a project Maven does not build.")
    Path testClasses;

    @Option(names = "--classpath", paramLabel = "PATH", split = ":",
            description = "The test classpath's jars and folders (':'-separated or repeated), for a project Maven does not build.")
    List<Path> classpath = new ArrayList<>();

    /** The folders given by hand, or none when the project is found through Maven. */
    Optional<ExplicitProject> project() {
        boolean any = !sourceRoots.isEmpty() || classes != null || testClasses != null || !classpath.isEmpty();
        if (!any) {
            return Optional.empty();
        }
        if (sourceRoots.isEmpty() || classes == null || testClasses == null) {
            throw new UserError("a project Maven does not build needs --source-root, --classes and --test-classes"
                    + " (and --classpath for its libraries); give all of them, or run in a folder with pom.xml", ExitCode.USAGE);
        }
        return Optional.of(new ExplicitProject(sourceRoots, testSourceRoots, classes, testClasses, classpath));
    }
}
