package dev.changeling.execution;

import java.util.List;
import java.util.Map;

/**
 * What every worker is told before it runs anything: how many mutation points there are, which
 * production classes to initialise first, and which tests make up the suite.
 *
 * @param pointCount              mutation points in the schema classes (ids 0 to pointCount - 1)
 * @param methodCount             methods of the schema whose entry is noted (ids 0 to methodCount - 1)
 * @param preinitialise           production classes to initialise once with no mutant on, so their static state
 *                                is the original's; a class that fails to initialise is reported, not fatal
 * @param testClasses             binary names of the test classes whose tests make up the suite, as the build selects them
 * @param includedTags            JUnit tag expressions a test must match; empty for every test
 * @param excludedTags            JUnit tag expressions whose tests are left out
 * @param configurationParameters JUnit Platform configuration parameters for every request, beside those the
 *                                platform reads itself (system properties, {@code junit-platform.properties})
 * @param freshJvmPerClass        whether the build runs every test class in a fresh JVM, which the baseline then
 *                                honours for the classes that fail in a shared worker
 */
public record SuiteSetup(int pointCount, int methodCount, List<String> preinitialise, List<String> testClasses,
                         List<String> includedTags, List<String> excludedTags, Map<String, String> configurationParameters,
                         boolean freshJvmPerClass) {

    public SuiteSetup {
        if (pointCount < 0) {
            throw new IllegalArgumentException("the point count must not be negative, not " + pointCount);
        }
        preinitialise = List.copyOf(preinitialise);
        testClasses = List.copyOf(testClasses);
        includedTags = List.copyOf(includedTags);
        excludedTags = List.copyOf(excludedTags);
        configurationParameters = Map.copyOf(configurationParameters);
    }

    /** These test classes, every tag, nothing pre-initialised. */
    public static SuiteSetup of(int pointCount, List<String> testClasses) {
        return new SuiteSetup(pointCount, 0, List.of(), testClasses, List.of(), List.of(), Map.of(), false);
    }

    public SuiteSetup withMethodCount(int methods) {
        return new SuiteSetup(pointCount, methods, preinitialise, testClasses, includedTags, excludedTags, configurationParameters, freshJvmPerClass);
    }

    public SuiteSetup withPreinitialise(List<String> classNames) {
        return new SuiteSetup(pointCount, methodCount, classNames, testClasses, includedTags, excludedTags, configurationParameters, freshJvmPerClass);
    }

    public SuiteSetup withTags(List<String> included, List<String> excluded) {
        return new SuiteSetup(pointCount, methodCount, preinitialise, testClasses, included, excluded, configurationParameters, freshJvmPerClass);
    }

    public SuiteSetup withFreshJvmPerClass(boolean fresh) {
        return new SuiteSetup(pointCount, methodCount, preinitialise, testClasses, includedTags, excludedTags, configurationParameters, fresh);
    }

    public SuiteSetup withConfigurationParameters(Map<String, String> parameters) {
        return new SuiteSetup(pointCount, methodCount, preinitialise, testClasses, includedTags, excludedTags, parameters, freshJvmPerClass);
    }
}
