package dev.changeling.project;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.Optional;

/**
 * The project's test suite as its build runs it ({@code mvn test}, through Maven Surefire): which test
 * classes, which tags, and the test JVM's properties, environment, options and working directory.
 *
 * @param testClasses             binary names of the test classes selected, sorted
 * @param origin                  where the selection comes from, in words (the pom's settings or Surefire's defaults)
 * @param excludedByPom           classes the includes select that the pom's excludes leave out
 * @param includedTags            JUnit tag expressions a test must match ({@code groups}); empty for all
 * @param excludedTags            JUnit tag expressions whose tests are left out ({@code excludedGroups})
 * @param systemProperties        system properties of the test JVM
 * @param environment             environment variables added for the test JVM
 * @param configurationParameters JUnit Platform configuration parameters the build hands the launcher
 * @param jvmArguments            the test JVM's options ({@code argLine}), without the heap size
 * @param maxHeap                 the heap size {@code argLine} sets, if it does
 * @param workingDirectory        the test JVM's working directory
 * @param freshJvmPerClass        whether the build starts a fresh JVM for every test class ({@code reuseForks=false})
 * @param skipReason              why the build runs no tests at all, when it is told to skip them
 * @param notices                 settings that could not be honoured exactly, one line each
 */
public record SuiteConfiguration(List<String> testClasses, String origin, int excludedByPom, List<String> includedTags,
                                 List<String> excludedTags, Map<String, String> systemProperties, Map<String, String> environment,
                                 Map<String, String> configurationParameters, List<String> jvmArguments, Optional<String> maxHeap,
                                 Path workingDirectory, boolean freshJvmPerClass, Optional<String> skipReason, List<String> notices) {

    public SuiteConfiguration {
        testClasses = List.copyOf(testClasses);
        includedTags = List.copyOf(includedTags);
        excludedTags = List.copyOf(excludedTags);
        systemProperties = sorted(systemProperties);
        environment = sorted(environment);
        configurationParameters = sorted(configurationParameters);
        jvmArguments = List.copyOf(jvmArguments);
        workingDirectory = workingDirectory.toAbsolutePath().normalize();
        notices = List.copyOf(notices);
    }

    /**
     * An unmodifiable copy in the order of its keys: the same settings always read, and print, the same way (an
     * unordered copy's order changes from one JVM to the next, and so would anything keyed by its text).
     */
    private static Map<String, String> sorted(Map<String, String> map) {
        return Collections.unmodifiableMap(new TreeMap<>(map));
    }

    /** What was taken from the build, in one line: {@code 47 classes as the pom's Surefire settings select them; 2 excluded by the pom; tags: !slow}. */
    public String summary() {
        List<String> parts = new ArrayList<>();
        parts.add(testClasses.size() + (testClasses.size() == 1 ? " class " : " classes ") + origin);
        if (excludedByPom > 0) {
            parts.add(excludedByPom + " excluded by the pom");
        }
        List<String> tags = new ArrayList<>(includedTags);
        excludedTags.forEach(tag -> tags.add("!" + tag));
        if (!tags.isEmpty()) {
            parts.add("tags: " + String.join(", ", tags));
        }
        List<String> jvm = new ArrayList<>();
        if (!jvmArguments.isEmpty() || maxHeap.isPresent()) {
            jvm.add("argLine");
        }
        long properties = systemProperties.keySet().stream().filter(name -> !name.equals("basedir")).count();
        if (properties > 0) {
            jvm.add(properties + (properties == 1 ? " system property" : " system properties"));
        }
        if (!environment.isEmpty()) {
            jvm.add(environment.size() + (environment.size() == 1 ? " environment variable" : " environment variables"));
        }
        if (!jvm.isEmpty()) {
            parts.add("with the pom's " + String.join(", ", jvm));
        }
        if (freshJvmPerClass) {
            parts.add("a fresh JVM per class (reuseForks=false)");
        }
        return String.join("; ", parts);
    }
}
