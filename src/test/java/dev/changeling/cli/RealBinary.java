package dev.changeling.cli;

import java.io.File;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/** The command line that starts the real {@code changeling} in a fresh JVM, on this test run's classpath. */
final class RealBinary {

    private RealBinary() {
    }

    static List<String> command(String... arguments) {
        List<String> command = new ArrayList<>();
        command.add(Path.of(System.getProperty("java.home"), "bin", "java").toString());
        command.add("-cp");
        command.add(classpath());
        command.add(Main.class.getName());
        command.addAll(List.of(arguments));
        return command;
    }

    /** Surefire puts the full test classpath in {@code java.class.path}; checked, so a bare booter jar fails loudly. */
    static String classpath() {
        String classpath = System.getProperty("java.class.path");
        boolean hasOurClasses = List.of(classpath.split(File.pathSeparator)).stream()
                .anyMatch(entry -> entry.endsWith("classes") || entry.endsWith("classes" + File.separator));
        if (!hasOurClasses) {
            throw new IllegalStateException("the test classpath does not list target/classes: " + classpath);
        }
        return classpath;
    }
}
