package dev.changeling.recall;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import org.objectweb.asm.ClassReader;
import org.objectweb.asm.ClassWriter;
import org.objectweb.asm.tree.AnnotationNode;
import org.objectweb.asm.tree.ClassNode;
import org.objectweb.asm.tree.MethodNode;

/**
 * A test class split in two: each JUnit test method, by method name, and the rest of the class. A test runs its own
 * method and the rest (fields, set-up, helpers), not its neighbours' methods, so a new or changed test method leaves its
 * neighbours' digests as they were. (A test method that calls another test method is the exception this cannot see.)
 *
 * @param rest    the digest of the class without its test methods
 * @param methods the digest of each test method's code, by name (overloads together)
 */
record TestMethods(String rest, Map<String, String> methods) {

    /** The annotations that make a method a test, as JUnit 4 and 5 name them. */
    private static final Set<String> TEST_ANNOTATIONS = Set.of("Lorg/junit/Test;", "Lorg/junit/jupiter/api/Test;",
            "Lorg/junit/jupiter/params/ParameterizedTest;", "Lorg/junit/jupiter/api/RepeatedTest;",
            "Lorg/junit/jupiter/api/TestFactory;", "Lorg/junit/jupiter/api/TestTemplate;");

    /** Splits the class; debug information (line numbers above all, which a new method shifts) does not count. */
    static TestMethods of(byte[] bytes) {
        ClassNode node = new ClassNode();
        new ClassReader(bytes).accept(node, ClassReader.SKIP_DEBUG);
        Map<String, StringBuilder> codes = new TreeMap<>();
        List<MethodNode> rest = new ArrayList<>();
        for (MethodNode method : node.methods) {
            if (isTest(method)) {
                codes.computeIfAbsent(method.name, name -> new StringBuilder()).append(method.desc).append(' ')
                        .append(ClassGraph.digest(alone(node, method))).append('\n');
            } else {
                rest.add(method);
            }
        }
        node.methods = rest;
        ClassWriter writer = new ClassWriter(0);
        node.accept(writer);
        Map<String, String> methods = new TreeMap<>();
        codes.forEach((name, text) -> methods.put(name, ClassGraph.digest(text.toString().getBytes(StandardCharsets.UTF_8))));
        return new TestMethods(ClassGraph.digest(writer.toByteArray()), methods);
    }

    private static boolean isTest(MethodNode method) {
        List<AnnotationNode> annotations = new ArrayList<>();
        if (method.visibleAnnotations != null) {
            annotations.addAll(method.visibleAnnotations);
        }
        if (method.invisibleAnnotations != null) {
            annotations.addAll(method.invisibleAnnotations);
        }
        return annotations.stream().anyMatch(annotation -> TEST_ANNOTATIONS.contains(annotation.desc));
    }

    /** The bytes of a class holding only this method: its code, as javac wrote it. */
    private static byte[] alone(ClassNode owner, MethodNode method) {
        ClassNode single = new ClassNode();
        single.version = owner.version;
        single.access = owner.access;
        single.name = owner.name;
        single.superName = owner.superName;
        single.methods.add(method);
        ClassWriter writer = new ClassWriter(0);
        single.accept(writer);
        return writer.toByteArray();
    }
}
