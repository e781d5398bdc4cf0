package dev.changeling.project;

import static dev.changeling.project.XmlElements.child;
import static dev.changeling.project.XmlElements.children;
import static dev.changeling.project.XmlElements.text;

import dev.changeling.UserError;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.w3c.dom.Element;
import org.xml.sax.SAXException;

/**
 * One module's POM as Maven itself resolved it (parents, profiles, properties and plugin management applied),
 * read from the file Maven's help plugin writes in the same mvn call that compiles the module.
 */
final class EffectivePom {

    static final String HELP_PLUGIN = "org.apache.maven.plugins:maven-help-plugin:3.5.1";

    private final Element project;

    private EffectivePom(Element project) {
        this.project = project;
    }

    /**
     * Reads the file; when Maven built several modules (a reactor build), the one whose build directory is
     * {@code buildDirectory} is taken.
     */
    static EffectivePom read(Path file, Path buildDirectory) {
        Element root = rootOf(file);
        if (!root.getTagName().equals("projects")) {
            return new EffectivePom(root);
        }
        String wanted = buildDirectory.toAbsolutePath().normalize().toString();
        return children(root, "project").stream()
                .filter(candidate -> child(child(candidate, "build").orElse(candidate), "directory")
                        .map(directory -> Path.of(text(directory)).toAbsolutePath().normalize().toString().equals(wanted))
                        .orElse(false))
                .findFirst()
                .map(EffectivePom::new)
                .orElseThrow(() -> new UserError(file + ": Maven's effective POM has no module building into " + wanted
                        + "; delete the build directory and run again"));
    }

    /**
     * The build directory of every module the file holds, in the order Maven wrote them: the reactor's order, in
     * which each module comes after the modules it needs.
     */
    static List<Path> buildDirectories(Path file) {
        Element root = rootOf(file);
        List<Element> projects = root.getTagName().equals("projects") ? children(root, "project") : List.of(root);
        return projects.stream()
                .flatMap(project -> child(project, "build").flatMap(build -> child(build, "directory")).stream())
                .map(directory -> Path.of(text(directory)).toAbsolutePath().normalize())
                .toList();
    }

    private static Element rootOf(Path file) {
        try {
            return XmlElements.root(file);
        } catch (SAXException | IOException e) {
            throw new UserError(file + ": Maven's effective POM cannot be read (" + e.getMessage()
                    + "); delete the build directory and run again");
        }
    }

    /** The model's properties, as Maven resolved them. */
    Map<String, String> properties() {
        Map<String, String> properties = new LinkedHashMap<>();
        child(project, "properties").ifPresent(element -> children(element).forEach(property -> properties.put(property.getTagName(), text(property))));
        return properties;
    }

    /**
     * The configuration a plugin's execution runs with: the plugin's own, with the execution's settings
     * taking the place of same-named ones. Empty when the build does not use the plugin.
     */
    Optional<PluginSettings> plugin(String artifactId, String executionId) {
        return child(project, "build").flatMap(build -> child(build, "plugins")).stream()
                .flatMap(plugins -> children(plugins, "plugin").stream())
                .filter(plugin -> child(plugin, "artifactId").map(XmlElements::text).orElse("").equals(artifactId))
                .filter(plugin -> child(plugin, "groupId").map(XmlElements::text).orElse("org.apache.maven.plugins")
                        .equals("org.apache.maven.plugins"))
                .findFirst()
                .map(plugin -> settings(plugin, executionId));
    }

    private static PluginSettings settings(Element plugin, String executionId) {
        Map<String, Element> merged = new LinkedHashMap<>();
        child(plugin, "configuration").ifPresent(configuration -> children(configuration).forEach(setting -> merged.put(setting.getTagName(), setting)));
        List<String> otherExecutions = new ArrayList<>();
        child(plugin, "executions").ifPresent(executions -> children(executions, "execution").forEach(execution -> {
            String id = child(execution, "id").map(XmlElements::text).orElse("default");
            if (id.equals(executionId)) {
                child(execution, "configuration").ifPresent(configuration -> children(configuration).forEach(setting -> merged.put(setting.getTagName(), setting)));
            } else {
                otherExecutions.add(id);
            }
        }));
        String version = child(plugin, "version").map(XmlElements::text).orElse("");
        return new PluginSettings(version, merged, otherExecutions);
    }

    /** A plugin's version and settings by name; values are the elements, read with the helpers below. */
    record PluginSettings(String version, Map<String, Element> settings, List<String> otherExecutions) {

        Optional<String> value(String name) {
            return Optional.ofNullable(settings.get(name)).map(XmlElements::text);
        }

        /** The texts of a list setting such as {@code <includes><include>…</include></includes>}. */
        List<String> list(String name) {
            Element element = settings.get(name);
            return element == null ? List.of() : children(element).stream().map(XmlElements::text).filter(text -> !text.isEmpty()).toList();
        }

        /** A map setting such as {@code <systemPropertyVariables><name>value</name></systemPropertyVariables>}. */
        Map<String, String> map(String name) {
            Map<String, String> map = new LinkedHashMap<>();
            Element element = settings.get(name);
            if (element != null) {
                for (Element entry : children(element)) {
                    Optional<Element> key = child(entry, "name");
                    if (entry.getTagName().equals("property") && key.isPresent()) {
                        map.put(text(key.get()), child(entry, "value").map(XmlElements::text).orElse(""));
                    } else {
                        map.put(entry.getTagName(), text(entry));
                    }
                }
            }
            return map;
        }
    }
}
