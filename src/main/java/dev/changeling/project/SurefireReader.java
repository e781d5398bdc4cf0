package dev.changeling.project;

import dev.changeling.UserError;
import java.io.IOException;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Properties;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads Maven Surefire's settings for {@code mvn test} (its {@code default-test} execution) from a module's
 * effective POM and selects the test classes as Surefire's scan does. A setting the pom leaves out falls back
 * to the property Surefire reads for it ({@code -Dtest}, {@code skipTests}, {@code groups}, {@code argLine}, …),
 * from the pom's properties or the {@code -D} arguments given to mvn.
 */
final class SurefireReader {

    private static final String PLUGIN = "maven-surefire-plugin";
    private static final String EXECUTION = "default-test";
    private static final Pattern VERSION = Pattern.compile("(\\d+)\\.(\\d+).*");

    private final EffectivePom.PluginSettings surefire;
    private final Map<String, String> properties;
    private final Map<String, String> userProperties;
    private final Path basedir;
    private final List<String> notices = new ArrayList<>();

    private SurefireReader(EffectivePom.PluginSettings surefire, Map<String, String> properties, Map<String, String> userProperties,
                           Path basedir) {
        this.surefire = surefire;
        this.properties = properties;
        this.userProperties = userProperties;
        this.basedir = basedir;
    }

    /**
     * The suite of a Maven module.
     *
     * @param userProperties the {@code -Dname=value} arguments the tool passes to mvn
     */
    static SuiteConfiguration read(EffectivePom pom, Path basedir, Path testClasses, Map<String, String> userProperties) {
        Map<String, String> properties = new LinkedHashMap<>(pom.properties());
        properties.put("basedir", basedir.toString());
        properties.put("project.basedir", basedir.toString());
        properties.putAll(userProperties);
        EffectivePom.PluginSettings surefire = pom.plugin(PLUGIN, EXECUTION)
                .orElse(new EffectivePom.PluginSettings("", Map.of(), List.of()));
        return new SurefireReader(surefire, properties, userProperties, basedir).read(testClasses, true);
    }

    /** The suite of a project given by hand: Surefire's default patterns, nothing else set. */
    static SuiteConfiguration defaults(Path basedir, Path testClasses) {
        return new SurefireReader(new EffectivePom.PluginSettings("", Map.of(), List.of()), Map.of("basedir", basedir.toString()),
                Map.of(), basedir).read(testClasses, false);
    }

    private SuiteConfiguration read(Path testClasses, boolean fromPom) {
        if (!surefire.otherExecutions().isEmpty()) {
            notices.add("Surefire also runs in the execution(s) " + String.join(", ", surefire.otherExecutions())
                    + "; only " + EXECUTION + " (what `mvn test` runs first) is followed");
        }
        if (olderThan(2, 22)) {
            notices.add("the pom's Surefire " + surefire.version() + " predates the JUnit Platform and would run fewer tests;"
                    + " the tests run here are those a current Surefire runs with these settings");
        }
        List<String> classes = ClassNames.below(testClasses);
        Selection selection = selection();
        List<String> selected = new ArrayList<>();
        int excluded = 0;
        for (String name : classes) {
            String file = SurefirePatterns.classFile(name);
            if (!selection.includes().matches(file)) {
                continue;
            }
            if (selection.excludes().matches(file)) {
                excluded += selection.excludesFromPom() ? 1 : 0;
            } else {
                selected.add(name);
            }
        }
        List<String> methodFilters = new ArrayList<>(selection.includes().methodFilters());
        methodFilters.addAll(selection.excludes().methodFilters());
        if (!methodFilters.isEmpty()) {
            notices.add("test patterns naming methods (" + String.join(", ", methodFilters) + ") are applied to whole classes");
        }
        Map<String, String> environment = new LinkedHashMap<>();
        surefire.map("environmentVariables").forEach((name, value) -> environment.put(name, filled(value)));
        ArgLine argLine = setting("argLine", "argLine")
                .map(line -> ArgLine.parse(line, properties, notices::add))
                .orElse(ArgLine.none());
        String origin = !fromPom ? "by Surefire's default patterns"
                : selection.fromPom() ? "as the pom's Surefire settings select them" : "as Surefire selects them by default";
        return new SuiteConfiguration(selected, origin, excluded, tags("groups"), tags("excludedGroups"),
                systemProperties(), environment, configurationParameters(), argLine.arguments(), argLine.maxHeap(),
                workingDirectory(), freshJvmPerClass(), skipReason(), notices);
    }

    /** The include and exclude patterns, as Surefire chooses them: {@code test} first, else the files and lists, else its defaults. */
    private Selection selection() {
        String where = basedir.resolve("pom.xml") + " (Surefire settings)";
        Optional<String> test = setting("test", "test").filter(value -> !value.isBlank());
        if (test.isPresent()) {
            List<String> includes = new ArrayList<>();
            List<String> excludes = new ArrayList<>();
            for (String part : test.get().split(",")) {
                String pattern = part.strip();
                if (pattern.startsWith("!")) {
                    excludes.add(pattern.substring(1));
                } else if (!pattern.isEmpty()) {
                    includes.add(pattern);
                }
            }
            return new Selection(SurefirePatterns.of(includes, where), SurefirePatterns.of(excludes, where), true, !excludes.isEmpty());
        }
        List<String> includes = new ArrayList<>(listFile(setting("includesFile", "surefire.includesFile")));
        includes.addAll(surefire.list("includes").stream().map(this::filled).toList());
        List<String> excludes = new ArrayList<>(listFile(setting("excludesFile", "surefire.excludesFile")));
        excludes.addAll(surefire.list("excludes").stream().map(this::filled).toList());
        boolean includesFromPom = !includes.isEmpty();
        boolean excludesFromPom = !excludes.isEmpty();
        if (!includesFromPom) {
            includes.addAll(defaultIncludes());
        }
        if (!excludesFromPom) {
            excludes.addAll(SurefirePatterns.DEFAULT_EXCLUDES);
        }
        return new Selection(SurefirePatterns.of(includes, where), SurefirePatterns.of(excludes, where),
                includesFromPom || excludesFromPom, excludesFromPom);
    }

    private record Selection(SurefirePatterns includes, SurefirePatterns excludes, boolean fromPom, boolean excludesFromPom) {
    }

    /** Surefire before 2.20 did not include {@code *Tests} classes by default. */
    private List<String> defaultIncludes() {
        return olderThan(2, 20) ? SurefirePatterns.DEFAULT_INCLUDES.stream().filter(pattern -> !pattern.endsWith("Tests.java")).toList()
                : SurefirePatterns.DEFAULT_INCLUDES;
    }

    private boolean olderThan(int major, int minor) {
        Matcher version = VERSION.matcher(surefire.version());
        return version.matches() && (Integer.parseInt(version.group(1)) < major
                || Integer.parseInt(version.group(1)) == major && Integer.parseInt(version.group(2)) < minor);
    }

    /** The patterns of an includes or excludes file: one per line, blank lines and {@code #} comments left out. */
    private List<String> listFile(Optional<String> name) {
        if (name.isEmpty() || name.get().isBlank()) {
            return List.of();
        }
        Path file = basedir.resolve(name.get().strip());
        try {
            return Files.readAllLines(file, StandardCharsets.UTF_8).stream()
                    .map(String::strip)
                    .filter(line -> !line.isEmpty() && !line.startsWith("#"))
                    .toList();
        } catch (IOException e) {
            throw new UserError(file + ": the pom names this file of test patterns, but it cannot be read (" + e.getMessage()
                    + "); create it or fix the pom");
        } catch (UncheckedIOException e) {
            throw new UserError(file + ": the pom names this file of test patterns, but it cannot be read; fix the file");
        }
    }

    private List<String> tags(String name) {
        return setting(name, name).stream()
                .flatMap(value -> Arrays.stream(value.split(",")))
                .map(String::strip)
                .filter(tag -> !tag.isEmpty())
                .toList();
    }

    /** Surefire's order: {@code basedir}, then systemProperties, then systemPropertyVariables, then mvn's own -D arguments. */
    private Map<String, String> systemProperties() {
        Map<String, String> system = new LinkedHashMap<>();
        system.put("basedir", basedir.toString());
        surefire.map("systemProperties").forEach((name, value) -> system.put(name, filled(value)));
        surefire.map("systemPropertyVariables").forEach((name, value) -> system.put(name, filled(value)));
        system.putAll(userProperties);
        return system;
    }

    /** The JUnit Platform parameters of {@code <properties><configurationParameters>}, written as a properties file. */
    private Map<String, String> configurationParameters() {
        String text = surefire.map("properties").get("configurationParameters");
        if (text == null || text.isBlank()) {
            return Map.of();
        }
        Properties parsed = new Properties();
        try {
            parsed.load(new StringReader(filled(text)));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        Map<String, String> parameters = new LinkedHashMap<>();
        parsed.stringPropertyNames().stream().sorted().forEach(name -> parameters.put(name, parsed.getProperty(name)));
        return parameters;
    }

    private Path workingDirectory() {
        return setting("workingDirectory", "basedir").map(folder -> basedir.resolve(folder)).orElse(basedir).normalize();
    }

    /** A fresh JVM per class only where forks are made at all ({@code forkCount} other than 0). */
    private boolean freshJvmPerClass() {
        boolean reuse = !setting("reuseForks", "reuseForks").map(String::strip).orElse("true").equalsIgnoreCase("false");
        boolean forks = !setting("forkCount", "forkCount").map(String::strip).orElse("1").equals("0");
        return !reuse && forks;
    }

    private Optional<String> skipReason() {
        for (String[] flag : new String[][] {{"skipTests", "skipTests"}, {"skip", "maven.test.skip"}, {"skipExec", "maven.test.skip.exec"}}) {
            if (setting(flag[0], flag[1]).map(String::strip).orElse("false").equalsIgnoreCase("true")) {
                return Optional.of("Surefire's " + flag[0] + " is true (property " + flag[1] + ")");
            }
        }
        return Optional.empty();
    }

    /** A setting from the pom's Surefire configuration, else from the property Surefire reads for it. */
    private Optional<String> setting(String name, String property) {
        Optional<String> configured = surefire.value(name).filter(value -> !value.isEmpty()).map(this::filled);
        return configured.isPresent() ? configured : Optional.ofNullable(properties.get(property)).map(this::filled);
    }

    /** Fills in the property references Maven left (it leaves unknown ones); an unknown one stays as written. */
    private String filled(String value) {
        return PropertyReferences.filled(value, properties);
    }
}
