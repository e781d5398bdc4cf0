package dev.changeling.project;

import dev.changeling.source.SourceHash;
import dev.changeling.AtomicFiles;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.TreeMap;
import java.util.stream.Stream;

/**
 * What the last successful mvn call saw: the content of every pom.xml involved, the arguments it was given, and
 * each source and resource file of the module. Kept as {@code maven-inputs.txt} under the build directory, so that a
 * later run can tell whether Maven would decide anything differently (a pom or an argument changed, a file went, a
 * resource changed: run mvn) or only Java sources changed, which the tool compiles itself.
 */
final class MavenMemo {

    static final String FILE = "maven-inputs.txt";

    /** The inputs by name: {@code pom <path>}, {@code arg <n>}, {@code file <path>}; values are content hashes or texts. */
    private final Map<String, String> inputs;

    private MavenMemo(Map<String, String> inputs) {
        this.inputs = inputs;
    }

    /**
     * The inputs as they are now.
     *
     * @param roots the module's source and resource folders; missing ones count as empty
     */
    static MavenMemo now(Path module, List<String> mavenArguments, List<Path> roots) {
        Map<String, String> inputs = new TreeMap<>();
        for (Path folder = module.toAbsolutePath().normalize(); folder != null && Files.isRegularFile(folder.resolve("pom.xml"));
             folder = folder.getParent()) {
            inputs.put("pom " + folder.resolve("pom.xml"), hash(folder.resolve("pom.xml")));
        }
        for (int i = 0; i < mavenArguments.size(); i++) {
            inputs.put("arg " + i, mavenArguments.get(i));
        }
        for (Path root : roots) {
            for (Path file : filesBelow(root)) {
                inputs.put("file " + file.toAbsolutePath().normalize(), hash(file));
            }
        }
        return new MavenMemo(inputs);
    }

    /** The memo last written there, or null when there is none or it cannot be read. */
    static MavenMemo read(Path file) {
        if (!Files.isRegularFile(file)) {
            return null;
        }
        Map<String, String> inputs = new TreeMap<>();
        try {
            for (String line : Files.readAllLines(file, StandardCharsets.UTF_8)) {
                int tab = line.indexOf('\t');
                if (tab > 0) {
                    inputs.put(line.substring(0, tab), line.substring(tab + 1));
                }
            }
        } catch (IOException | UncheckedIOException e) {
            return null;
        }
        return new MavenMemo(inputs);
    }

    void write(Path file) {
        StringBuilder text = new StringBuilder();
        inputs.forEach((name, value) -> text.append(name).append('\t').append(value).append('\n'));
        try {
            AtomicFiles.writeString(file, text.toString());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * The Java sources added or changed since {@code earlier}, when that is all that changed; null when anything
     * Maven decides on differs (a pom, an argument, a removed file, any file other than a Java source).
     */
    List<Path> changedJavaSourcesSince(MavenMemo earlier) {
        List<Path> changed = new ArrayList<>();
        for (Map.Entry<String, String> input : inputs.entrySet()) {
            String before = earlier.inputs.get(input.getKey());
            if (Objects.equals(before, input.getValue())) {
                continue;
            }
            if (!input.getKey().startsWith("file ") || !input.getKey().endsWith(".java")) {
                return null;
            }
            changed.add(Path.of(input.getKey().substring("file ".length())));
        }
        boolean nothingGone = earlier.inputs.keySet().stream().allMatch(inputs::containsKey);
        return nothingGone ? changed : null;
    }

    private static List<Path> filesBelow(Path root) {
        if (!Files.isDirectory(root)) {
            return List.of();
        }
        try (Stream<Path> walk = Files.walk(root)) {
            return walk.filter(Files::isRegularFile).sorted().toList();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static String hash(Path file) {
        try {
            return SourceHash.sha256(Files.readAllBytes(file));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
