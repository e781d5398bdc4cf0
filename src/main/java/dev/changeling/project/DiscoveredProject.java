package dev.changeling.project;

import java.nio.file.Path;
import java.time.Duration;
import java.util.List;

/**
 * A project compiled and ready to mutate and test.
 *
 * @param layout               root, main and test source folders, build directory
 * @param classesDirectory     the compiled main classes (the originals that mutants replace)
 * @param testClassRoots       folders holding the compiled test classes, to discover tests in
 * @param compileClasspath     the compiled main classes, then every dependency: enough to compile a mutant
 * @param testClasspath        test classes, main classes, dependencies, with a JUnit launcher of the engine's
 *                             version: the worker classpath, less the schema classes (first) and the worker (last)
 * @param productionClasses    binary names of every main class, for a worker to load before the first test
 * @param suite                the tests as the build runs them: classes, tags, the test JVM's settings
 * @param mavenTime            how long mvn ran in this discovery, all calls added up; zero when it did not run
 * @param build                how the project was built, in words for the user
 * @param junitPlatformVersion the version of the JUnit Platform launcher and engine on the test classpath
 * @param junitSetup           what was done to the JUnit artifacts, in words for the user
 */
public record DiscoveredProject(ProjectLayout layout, Path classesDirectory, List<Path> testClassRoots,
                                List<Path> compileClasspath, List<Path> testClasspath, List<String> productionClasses,
                                SuiteConfiguration suite, Duration mavenTime, String build, String junitPlatformVersion, String junitSetup) {

    public DiscoveredProject {
        testClassRoots = List.copyOf(testClassRoots);
        compileClasspath = List.copyOf(compileClasspath);
        testClasspath = List.copyOf(testClasspath);
        productionClasses = List.copyOf(productionClasses);
    }
}
