package dev.changeling.recall;

import dev.changeling.source.SourceHash;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.Collection;
import java.util.Deque;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.stream.Stream;
import org.objectweb.asm.ClassReader;
import org.objectweb.asm.ClassVisitor;
import org.objectweb.asm.ClassWriter;
import org.objectweb.asm.Opcodes;
import org.objectweb.asm.tree.ClassNode;

/**
 * The compiled classes of a project's output folders: each class's bytes by digest, the source file javac compiled it
 * from, and the classes its constant pool names (every class whose code or fields it can use without reflection).
 * Whatever a class can reach this way is what its behaviour can depend on.
 */
final class ClassGraph {

    private static final int CONSTANT_CLASS = 7;

    /**
     * One class file: its digest, the digest of what another class's compilation reads of it (everything but the
     * methods' code and debug information), its source by package path ({@code org/x/Foo.java}), the classes it names.
     */
    private record Node(String digest, String apiDigest, String source, Set<String> names, TestMethods tests) {
    }

    private final Map<String, Node> nodes;
    private final Map<String, List<String>> bySource = new HashMap<>();
    private final Map<String, Set<String>> closures = new HashMap<>();

    private ClassGraph(Map<String, Node> nodes) {
        this.nodes = nodes;
        nodes.forEach((name, node) -> {
            if (node.source() != null) {
                bySource.computeIfAbsent(node.source(), source -> new java.util.ArrayList<>()).add(name);
            }
        });
    }

    /** Every class file below the folders (internal names, {@code org/x/Foo$Bar}); a missing folder has none. */
    static ClassGraph read(Collection<Path> folders) {
        return read(folders, false);
    }

    /** Test classes as {@link #read(Collection)} reads classes, each also split into its test methods and the rest. */
    static ClassGraph readTests(Collection<Path> folders) {
        return read(folders, true);
    }

    private static ClassGraph read(Collection<Path> folders, boolean tests) {
        Map<String, Node> nodes = new TreeMap<>();
        for (Path folder : folders) {
            if (!Files.isDirectory(folder)) {
                continue;
            }
            try (Stream<Path> files = Files.walk(folder)) {
                for (Path file : files.filter(path -> path.toString().endsWith(".class")).toList()) {
                    byte[] bytes = Files.readAllBytes(file);
                    String name = folder.relativize(file).toString().replace('\\', '/');
                    nodes.putIfAbsent(name.substring(0, name.length() - ".class".length()), node(bytes, tests));
                }
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
        return new ClassGraph(nodes);
    }

    private static Node node(byte[] bytes, boolean tests) {
        ClassReader reader = new ClassReader(bytes);
        char[] buffer = new char[reader.getMaxStringLength()];
        Set<String> names = new TreeSet<>();
        for (int item = 1; item < reader.getItemCount(); item++) {
            int offset = reader.getItem(item);
            if (offset > 0 && reader.readByte(offset - 1) == CONSTANT_CLASS) {
                names.add(elementType(reader.readUTF8(offset, buffer)));
            }
        }
        String[] source = new String[1];
        reader.accept(new ClassVisitor(Opcodes.ASM9) {
            @Override
            public void visitSource(String file, String debug) {
                source[0] = file;
            }
        }, ClassReader.SKIP_CODE | ClassReader.SKIP_FRAMES);
        String name = reader.getClassName();
        String packagePath = name.lastIndexOf('/') < 0 ? "" : name.substring(0, name.lastIndexOf('/') + 1);
        String sourcePath = source[0] != null ? packagePath + source[0] : conventionalSource(name);
        ClassNode api = new ClassNode();
        reader.accept(api, ClassReader.SKIP_CODE | ClassReader.SKIP_DEBUG | ClassReader.SKIP_FRAMES);
        ClassWriter writer = new ClassWriter(0);
        api.accept(writer);
        return new Node(digest(bytes), digest(writer.toByteArray()), sourcePath, names, tests ? TestMethods.of(bytes) : null);
    }

    /** Without a source attribute, the file javac names after the top-level class. */
    private static String conventionalSource(String name) {
        int nested = name.indexOf('$', name.lastIndexOf('/') + 1);
        return (nested < 0 ? name : name.substring(0, nested)) + ".java";
    }

    /** {@code [[Lorg/x/Foo;} names {@code org/x/Foo}; a primitive array names no class of ours. */
    private static String elementType(String name) {
        int dims = 0;
        while (dims < name.length() && name.charAt(dims) == '[') {
            dims++;
        }
        return dims > 0 && name.length() > dims + 1 && name.charAt(dims) == 'L' ? name.substring(dims + 1, name.length() - 1)
                : name.substring(dims);
    }

    static String digest(byte[] bytes) {
        return SourceHash.sha256(bytes);
    }

    /** Every class the folders hold (internal names). */
    Set<String> names() {
        return nodes.keySet();
    }

    /** Whether the folders hold this class (internal name). */
    boolean holds(String name) {
        return nodes.containsKey(name);
    }

    /**
     * The classes compiled from a source file given by its path ({@code src/main/java/org/x/Foo.java}): those whose
     * package path and source attribute end it.
     */
    List<String> classesOf(String sourcePath) {
        String source = sourceOf(sourcePath);
        return source == null ? List.of() : bySource.get(source);
    }

    /** The source, by package path ({@code org/x/Foo.java}), that a file's path ends with, or null when no class has it. */
    String sourceOf(String sourcePath) {
        String path = sourcePath.replace('\\', '/');
        for (int slash = -1; ; slash = path.indexOf('/', slash + 1)) {
            if (bySource.containsKey(path.substring(slash + 1))) {
                return path.substring(slash + 1);
            }
            if (path.indexOf('/', slash + 1) < 0) {
                return null;
            }
        }
    }

    /** Every source the classes were compiled from, by package path. */
    Set<String> sources() {
        return bySource.keySet();
    }

    /** The classes compiled from a source given by package path ({@code org/x/Foo.java}). */
    List<String> classesOfSource(String source) {
        return bySource.getOrDefault(source, List.of());
    }

    /** The classes of the folders that a class can reach by the names in constant pools, itself and its nested classes included. */
    Set<String> closure(String name) {
        return closures.computeIfAbsent(name, this::walk);
    }

    private Set<String> walk(String start) {
        Set<String> seen = new TreeSet<>();
        Deque<String> pending = new ArrayDeque<>();
        pending.add(start);
        String nestedPrefix = start + "$";
        nodes.keySet().stream().filter(name -> name.startsWith(nestedPrefix)).forEach(pending::add);
        while (!pending.isEmpty()) {
            String name = pending.poll();
            Node node = nodes.get(name);
            if (node != null && seen.add(name)) {
                pending.addAll(node.names());
            }
        }
        return seen;
    }

    /** One digest of the classes' names and bytes; a class the folders do not hold counts as absent. */
    String digestOf(Collection<String> classes) {
        return digestOf(classes, Node::digest);
    }

    /** One digest of what compiling against the classes reads of them: as {@link #digestOf}, without methods' code. */
    String apiDigestOf(Collection<String> classes) {
        return digestOf(classes, Node::apiDigest);
    }

    /**
     * One digest of what a test of this method name runs of the classes: each class without the code of its test
     * methods, with the code of those of this name (its own, or one it inherits); a class read without its tests split
     * counts whole.
     */
    String testDigestOf(Collection<String> classes, String method) {
        return digestOf(classes, node -> node.tests() == null ? node.digest()
                : node.tests().rest() + " " + node.tests().methods().getOrDefault(method, "-"));
    }

    private String digestOf(Collection<String> classes, java.util.function.Function<Node, String> part) {
        StringBuilder text = new StringBuilder();
        new TreeSet<>(classes).forEach(name -> text.append(name).append(' ')
                .append(nodes.containsKey(name) ? part.apply(nodes.get(name)) : "absent").append('\n'));
        return SourceHash.sha256(text.toString());
    }
}
