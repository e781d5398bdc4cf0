package dev.changeling.project;

import static dev.changeling.project.XmlElements.child;
import static dev.changeling.project.XmlElements.children;
import static dev.changeling.project.XmlElements.text;

import dev.changeling.UserError;
import java.io.IOException;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.w3c.dom.Element;
import org.xml.sax.SAXException;

/**
 * What the tool needs to know of one pom.xml before running mvn: its packaging, its modules and its
 * build folders. Only the file itself is read; values inherited from a parent fall back to Maven's defaults.
 */
record PomFile(Path file, String packaging, List<String> modules, Map<String, String> build, Map<String, String> properties) {

    private static final Pattern EXPRESSION = Pattern.compile("\\$\\{([^}]+)}");

    /** The folders a Maven build reads and writes, as absolute paths. */
    record BuildFolders(Path directory, Path classes, Path testClasses, Path sources, Path testSources) {
    }

    static PomFile read(Path file) {
        Element project;
        try {
            project = XmlElements.root(file);
        } catch (SAXException | IOException e) {
            throw new UserError(file + ": not a readable pom.xml (" + e.getMessage() + "); fix the file or give another folder");
        }
        Map<String, String> build = new LinkedHashMap<>();
        child(project, "build").ifPresent(element -> children(element).forEach(setting -> build.put(setting.getTagName(), text(setting))));
        Map<String, String> properties = new LinkedHashMap<>();
        child(project, "properties").ifPresent(element -> children(element).forEach(property -> properties.put(property.getTagName(), text(property))));
        List<String> modules = child(project, "modules")
                .map(element -> children(element).stream().filter(module -> module.getTagName().equals("module")).map(XmlElements::text).toList())
                .orElse(List.of());
        String packaging = child(project, "packaging").map(XmlElements::text).orElse("jar");
        return new PomFile(file, packaging, modules, build, properties);
    }

    /** A pom that only lists modules and has no code of its own. */
    boolean isAggregator() {
        return packaging.equals("pom") && !modules.isEmpty();
    }

    /** The folders of the modules this pom lists, normalised. */
    List<Path> moduleFolders() {
        Path base = file.toAbsolutePath().getParent();
        return modules.stream().map(module -> {
            Path resolved = base.resolve(module).normalize();
            return resolved.toString().endsWith(".xml") ? resolved.getParent() : resolved;
        }).toList();
    }

    BuildFolders folders() {
        Path base = file.toAbsolutePath().normalize().getParent();
        Map<String, String> known = new LinkedHashMap<>(properties);
        known.put("basedir", base.toString());
        known.put("project.basedir", base.toString());
        Path directory = folder(base, "directory", "target", known);
        known.put("project.build.directory", directory.toString());
        return new BuildFolders(directory,
                folder(base, "outputDirectory", directory.resolve("classes").toString(), known),
                folder(base, "testOutputDirectory", directory.resolve("test-classes").toString(), known),
                folder(base, "sourceDirectory", "src/main/java", known),
                folder(base, "testSourceDirectory", "src/test/java", known));
    }

    private Path folder(Path base, String setting, String standard, Map<String, String> known) {
        String value = build.get(setting);
        String resolved = value == null ? null : interpolated(value, known);
        return base.resolve(resolved == null ? standard : resolved).normalize();
    }

    /** The value with every ${name} filled in, or null when one cannot be (it is inherited or computed). */
    private static String interpolated(String value, Map<String, String> known) {
        String current = value;
        for (int round = 0; round < 10 && current.contains("${"); round++) {
            Matcher matcher = EXPRESSION.matcher(current);
            StringBuilder filled = new StringBuilder();
            while (matcher.find()) {
                String replacement = known.get(matcher.group(1));
                if (replacement == null) {
                    return null;
                }
                matcher.appendReplacement(filled, Matcher.quoteReplacement(replacement));
            }
            matcher.appendTail(filled);
            current = filled.toString();
        }
        return current.contains("${") ? null : current;
    }
}
