package dev.changeling.project;

import java.nio.file.Path;
import java.util.List;

/**
 * A project's folders and classpath given by hand instead of found through Maven. Relative paths are taken
 * from the current folder, as a shell would.
 *
 * @param sourceRoots          main source folders (the code to mutate)
 * @param testSourceRoots      test source folders; may be empty
 * @param classesDirectory     the compiled main classes
 * @param testClassesDirectory the compiled test classes
 * @param classpath            every other jar or folder the tests need, in order
 */
public record ExplicitProject(List<Path> sourceRoots, List<Path> testSourceRoots, Path classesDirectory,
                              Path testClassesDirectory, List<Path> classpath) {

    public ExplicitProject {
        sourceRoots = List.copyOf(sourceRoots);
        testSourceRoots = List.copyOf(testSourceRoots);
        classpath = List.copyOf(classpath);
    }
}
