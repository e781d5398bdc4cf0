package dev.changeling.worker;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.DataInputStream;
import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

/**
 * The worker runs inside the project's JVM next to the project's own dependencies, so it may use only
 * the JDK, the JUnit Platform and the probe; the probe may use only the JDK. Checked on the compiled
 * classes, whose constant pools name every class they use, however it is written in the source.
 */
class WorkerIsolationTest {

    private static final List<String> WORKER_MAY_USE = List.of("java/", "javax/", "org/junit/platform/", "dev/changeling/worker/", "dev/changeling/probe/");
    private static final List<String> PROBE_MAY_USE = List.of("java/", "dev/changeling/probe/");

    @Nested
    class TheWorkerPackage {

        @Test
        void usesOnlyTheJdkTheJUnitPlatformAndTheProbe() throws Exception {
            assertEquals(Set.of(), forbidden("dev/changeling/worker", WORKER_MAY_USE));
        }

        @Test
        void isReallyScanned_itUsesTheLauncher() throws Exception {
            assertTrue(referencedBy("dev/changeling/worker").contains("org/junit/platform/launcher/Launcher"));
        }
    }

    @Nested
    class TheProbePackage {

        @Test
        void usesOnlyTheJdk() throws Exception {
            assertEquals(Set.of(), forbidden("dev/changeling/probe", PROBE_MAY_USE));
        }
    }

    @Nested
    class TheCheckItself {

        @Test
        void catchesAPackageThatUsesTheRestOfTheTool() throws Exception {
            Set<String> found = forbidden("dev/changeling/execution", WORKER_MAY_USE);
            assertFalse(found.isEmpty());
            assertTrue(found.contains("dev/changeling/UserError"), found::toString);
        }
    }

    private static Set<String> forbidden(String packageFolder, List<String> allowed) throws Exception {
        Set<String> forbidden = new TreeSet<>();
        for (String name : referencedBy(packageFolder)) {
            if (allowed.stream().noneMatch(name::startsWith)) {
                forbidden.add(name);
            }
        }
        return forbidden;
    }

    /** Every class named in the constant pools of the package's class files: class entries and type descriptors. */
    private static Set<String> referencedBy(String packageFolder) throws IOException, URISyntaxException {
        Path root = Path.of(WorkerMain.class.getProtectionDomain().getCodeSource().getLocation().toURI());
        Path folder = root.resolve(packageFolder);
        assertTrue(Files.isDirectory(folder), folder + " is not a folder of classes");
        Set<String> names = new TreeSet<>();
        try (Stream<Path> files = Files.list(folder)) {
            for (Path file : files.filter(path -> path.toString().endsWith(".class")).toList()) {
                names.addAll(ConstantPool.classNames(Files.readAllBytes(file)));
            }
        }
        assertFalse(names.isEmpty());
        return names;
    }

    /** Reads a class file's constant pool (JVM specification, chapter 4.4) for the classes it names. */
    static final class ConstantPool {

        private static final Pattern DESCRIPTOR_CLASS = Pattern.compile("L([A-Za-z_$][\\w$]*(?:/[A-Za-z_$][\\w$]*)+)[;<]");

        static Set<String> classNames(byte[] classFile) throws IOException {
            DataInputStream in = new DataInputStream(new ByteArrayInputStream(classFile));
            if (in.readInt() != 0xCAFEBABE) {
                throw new IOException("not a class file");
            }
            in.readUnsignedShort();
            in.readUnsignedShort();
            int count = in.readUnsignedShort();
            String[] utf8 = new String[count];
            List<Integer> classEntries = new java.util.ArrayList<>();
            for (int index = 1; index < count; index++) {
                int tag = in.readUnsignedByte();
                switch (tag) {
                    case 1 -> utf8[index] = in.readUTF();
                    case 7 -> classEntries.add(in.readUnsignedShort());
                    case 8, 16, 19, 20 -> in.readUnsignedShort();
                    case 3, 4, 9, 10, 11, 12, 17, 18 -> in.readInt();
                    case 15 -> {
                        in.readUnsignedByte();
                        in.readUnsignedShort();
                    }
                    case 5, 6 -> {
                        in.readLong();
                        index++;
                    }
                    default -> throw new IOException("unknown constant pool tag " + tag);
                }
            }
            Set<String> names = new TreeSet<>();
            for (int entry : classEntries) {
                String name = utf8[entry];
                names.add(name.replaceFirst("^\\[+L?", "").replaceFirst(";$", ""));
            }
            for (String text : utf8) {
                if (text != null) {
                    Matcher matcher = DESCRIPTOR_CLASS.matcher(text);
                    while (matcher.find()) {
                        names.add(matcher.group(1));
                    }
                }
            }
            names.removeIf(name -> name.length() == 1 && "BCDFIJSZV".contains(name));
            return names;
        }
    }
}
