package dev.changeling.recall;

import dev.changeling.mutant.EntryMethods;
import dev.changeling.mutant.EntryMethods.EntryMethod;
import dev.changeling.mutant.Point;
import dev.changeling.source.SourceFile;
import dev.changeling.source.SourceHash;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.stream.Collectors;

/**
 * The code of a run's schema as content: its points and the methods whose entry it notes, each by id, and the files
 * they are in. A method's body and a file less those bodies (its skeleton) are what a test that entered some of the
 * methods depends on.
 */
public final class SchemaCode {

    private final List<Point> points;
    private final List<EntryMethod> methods;
    private final Map<String, String> bodies = new HashMap<>();
    /** The skeleton's digest of each file with points, by path (so its keys are those paths, sorted). */
    private final Map<String, String> skeletons = new TreeMap<>();

    /**
     * @param points  the schema's points, by id
     * @param methods the schema's methods whose entry it notes, by id
     * @param files   the original files by project-relative path, every file of a point among them
     */
    public SchemaCode(List<Point> points, List<EntryMethod> methods, Map<String, SourceFile> files) {
        this.points = List.copyOf(points);
        this.methods = List.copyOf(methods);
        Map<String, List<EntryMethod>> byFile = methods.stream().collect(Collectors.groupingBy(EntryMethod::file));
        for (String path : points.stream().map(Point::file).collect(Collectors.toCollection(TreeSet::new))) {
            SourceFile file = files.get(path);
            List<EntryMethod> own = byFile.getOrDefault(path, List.of());
            own.forEach(method -> bodies.put(method.name(), SourceHash.sha256(file.textOf(method.body()))));
            skeletons.put(path, SourceHash.sha256(EntryMethods.skeleton(file, own)));
        }
    }

    public List<Point> points() {
        return points;
    }

    public List<EntryMethod> methods() {
        return methods;
    }

    /** The project-relative paths of the files with points, sorted. */
    public Set<String> paths() {
        return Collections.unmodifiableSet(skeletons.keySet());
    }

    /** The digest of a file with points, less the bodies of its noted methods. */
    public String skeleton(String path) {
        return skeletons.get(path);
    }

    /** The digest of each noted method's body, by the method's name. */
    public Map<String, String> bodies() {
        return bodies;
    }

    /** The digest of the noted methods' bodies in a file with points, by method name. */
    public Map<String, String> bodiesIn(String path) {
        Map<String, String> own = new TreeMap<>();
        methods.stream().filter(method -> method.file().equals(path)).forEach(method -> own.put(method.name(), bodies.get(method.name())));
        return own;
    }

    /** The noted method whose body holds the offset, in the file at {@code path}; null when none does. */
    public EntryMethod methodAt(String path, int offset) {
        for (EntryMethod method : methods) {
            if (method.file().equals(path) && method.body().contains(offset)) {
                return method;
            }
        }
        return null;
    }
}
