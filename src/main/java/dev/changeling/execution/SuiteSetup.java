package dev.changeling.execution;

import java.nio.file.Path;
import java.util.List;

/**
 * What every worker is told before it runs anything: how many mutation points there are, which
 * production classes to initialise first, and where and how to find the tests.
 *
 * @param pointCount    mutation points in the schema classes (ids 0 to pointCount - 1)
 * @param preinitialise production classes to initialise once with no mutant on, so their static state
 *                      is the original's; a class that fails to initialise is reported, not fatal
 * @param testRoots     the folders of compiled test classes to discover tests in
 * @param includes      test class name patterns; {@code *} stands for any part of a name without dots,
 *                      {@code **} for anything; a pattern without a dot is matched against the simple
 *                      name, one with a dot against the qualified name; {@code **}{@code /*Test.java} also works
 * @param excludes      test class name patterns to leave out, same syntax
 * @param excludedTags  JUnit tags (tag expressions) whose tests are left out
 */
public record SuiteSetup(int pointCount, List<String> preinitialise, List<Path> testRoots,
                         List<String> includes, List<String> excludes, List<String> excludedTags) {

    /** The test classes a Maven build runs when it is not told otherwise (its test plugin's defaults). */
    public static final List<String> DEFAULT_INCLUDES = List.of("Test*", "*Test", "*Tests", "*TestCase");
    /**
     * Likewise left out by default: nested classes found on their own. JUnit Jupiter's {@code @Nested}
     * classes still run, found through the class that encloses them.
     */
    public static final List<String> DEFAULT_EXCLUDES = List.of("*$*");

    public SuiteSetup {
        if (pointCount < 0) {
            throw new IllegalArgumentException("the point count must not be negative, not " + pointCount);
        }
        preinitialise = List.copyOf(preinitialise);
        testRoots = testRoots.stream().map(root -> root.toAbsolutePath().normalize()).toList();
        includes = List.copyOf(includes);
        excludes = List.copyOf(excludes);
        excludedTags = List.copyOf(excludedTags);
        includes.forEach(ClassPatterns::toRegex);
        excludes.forEach(ClassPatterns::toRegex);
    }

    /** The default test classes below the given roots, nothing pre-initialised. */
    public static SuiteSetup of(int pointCount, List<Path> testRoots) {
        return new SuiteSetup(pointCount, List.of(), testRoots, DEFAULT_INCLUDES, DEFAULT_EXCLUDES, List.of());
    }

    public SuiteSetup withPreinitialise(List<String> classNames) {
        return new SuiteSetup(pointCount, classNames, testRoots, includes, excludes, excludedTags);
    }

    public SuiteSetup withIncludes(List<String> patterns) {
        return new SuiteSetup(pointCount, preinitialise, testRoots, patterns, excludes, excludedTags);
    }

    public SuiteSetup withExcludes(List<String> patterns) {
        return new SuiteSetup(pointCount, preinitialise, testRoots, includes, patterns, excludedTags);
    }

    public SuiteSetup withExcludedTags(List<String> tags) {
        return new SuiteSetup(pointCount, preinitialise, testRoots, includes, excludes, tags);
    }
}
