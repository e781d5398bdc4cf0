package dev.changeling.project;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.Charset;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import javax.tools.JavaCompiler;
import javax.tools.StandardJavaFileManager;
import javax.tools.StandardLocation;
import javax.tools.ToolProvider;

/**
 * Compiles a module's changed Java sources in this JVM, into the folders Maven compiled them into, with the options
 * the pom gives Maven's compiler plugin (release or source and target, encoding, parameters, compiler arguments).
 * A pom that makes the compiler do more than javac alone does (annotation processor paths, another compiler, a
 * forked one) is left to Maven.
 */
final class InProcessCompile {

    private static final String PLUGIN = "maven-compiler-plugin";
    private static final List<String> LEFT_TO_MAVEN = List.of("annotationProcessorPaths", "annotationProcessors", "proc",
            "compilerId", "fork", "compilerArgument", "compilerArguments");

    private InProcessCompile() {
    }

    /**
     * Compiles the files of one source set (main or test); false when javac reports an error or the pom's
     * settings are not javac's alone, and Maven must compile instead.
     */
    static boolean compile(List<Path> files, Path output, List<Path> classpath, EffectivePom pom, String execution) {
        if (files.isEmpty()) {
            return true;
        }
        Optional<List<String>> options = options(pom, execution);
        JavaCompiler javac = ToolProvider.getSystemJavaCompiler();
        if (options.isEmpty() || javac == null) {
            return false;
        }
        List<String> arguments = new ArrayList<>(options.get());
        arguments.addAll(List.of("-d", output.toString()));
        Charset encoding = encoding(arguments);
        try (StandardJavaFileManager manager = javac.getStandardFileManager(null, null, encoding)) {
            manager.setLocationFromPaths(StandardLocation.CLASS_PATH, classpath);
            return javac.getTask(Writer.nullWriter(), manager, null, arguments, null, manager.getJavaFileObjectsFromPaths(files)).call();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (IllegalArgumentException unknownOption) {
            return false;
        }
    }

    /** javac's options as Maven's compiler plugin would pass them, or empty when the pom asks for more than javac. */
    static Optional<List<String>> options(EffectivePom pom, String execution) {
        EffectivePom.PluginSettings compiler = pom.plugin(PLUGIN, execution)
                .orElse(new EffectivePom.PluginSettings("", Map.of(), List.of()));
        if (LEFT_TO_MAVEN.stream().anyMatch(compiler.settings()::containsKey)) {
            return Optional.empty();
        }
        Map<String, String> properties = pom.properties();
        List<String> options = new ArrayList<>(List.of("-g", "-nowarn"));
        Optional<String> release = setting(compiler, properties, "release", "maven.compiler.release");
        if (release.isPresent()) {
            options.addAll(List.of("--release", release.get()));
        } else {
            setting(compiler, properties, "source", "maven.compiler.source").ifPresent(source -> options.addAll(List.of("-source", source)));
            setting(compiler, properties, "target", "maven.compiler.target").ifPresent(target -> options.addAll(List.of("-target", target)));
        }
        setting(compiler, properties, "encoding", "project.build.sourceEncoding").ifPresent(encoding -> options.addAll(List.of("-encoding", encoding)));
        if (setting(compiler, properties, "parameters", "maven.compiler.parameters").orElse("false").equals("true")) {
            options.add("-parameters");
        }
        options.addAll(compiler.list("compilerArgs"));
        return Optional.of(options);
    }

    private static Optional<String> setting(EffectivePom.PluginSettings compiler, Map<String, String> properties,
                                            String name, String property) {
        Optional<String> configured = compiler.value(name).filter(value -> !value.isEmpty() && !value.contains("${"));
        return configured.isPresent() ? configured : Optional.ofNullable(properties.get(property)).filter(value -> !value.isEmpty());
    }

    private static Charset encoding(List<String> arguments) {
        int at = arguments.indexOf("-encoding");
        try {
            return at >= 0 ? Charset.forName(arguments.get(at + 1)) : null;
        } catch (IllegalArgumentException unknown) {
            return null;
        }
    }
}
