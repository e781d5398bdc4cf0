package dev.changeling.support;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.changeling.mutant.Point;
import dev.changeling.mutant.PointFinder;
import dev.changeling.operator.Operators;
import dev.changeling.source.JavaSources;
import dev.changeling.source.SourceFile;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/** A throwaway git repository for tests, driven with the real git and isolated from the user's git settings. */
public final class GitFixture {

    public final Path repository;

    private GitFixture(Path repository) {
        this.repository = repository;
    }

    public static GitFixture init(Path folder) {
        try {
            Files.createDirectories(folder);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        GitFixture fixture = new GitFixture(folder);
        fixture.git("init", "-q", "-b", "main");
        return fixture;
    }

    public Path write(String path, String text) {
        Path file = repository.resolve(path);
        try {
            Files.createDirectories(file.getParent());
            Files.writeString(file, text, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return file;
    }

    public String read(String path) {
        try {
            return Files.readString(repository.resolve(path), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Replaces the one occurrence of a text in a file; the test is wrong if it is not there exactly once. */
    public void replace(String path, String from, String to) {
        String text = read(path);
        assertEquals(text.indexOf(from), text.lastIndexOf(from), "'" + from + "' must occur once in " + path);
        if (text.indexOf(from) < 0) {
            throw new AssertionError("'" + from + "' is not in " + path);
        }
        write(path, text.replace(from, to));
    }

    public void commitAll(String message) {
        git("add", "-A");
        git("commit", "-q", "-m", message);
    }

    /** Runs git in the repository; a failure fails the test with git's own words. */
    public String git(String... arguments) {
        Result result = tryGit(arguments);
        if (result.exitCode() != 0) {
            throw new AssertionError("git " + String.join(" ", arguments) + " failed: " + result.err());
        }
        return result.out();
    }

    public record Result(int exitCode, String out, String err) {
    }

    public Result tryGit(String... arguments) {
        List<String> command = new ArrayList<>(List.of("git"));
        command.addAll(List.of(arguments));
        ProcessBuilder builder = new ProcessBuilder(command).directory(repository.toFile());
        builder.environment().put("GIT_CONFIG_NOSYSTEM", "1");
        builder.environment().put("GIT_CONFIG_GLOBAL", "/dev/null");
        builder.environment().put("GIT_AUTHOR_NAME", "Test Author");
        builder.environment().put("GIT_AUTHOR_EMAIL", "author@example.org");
        builder.environment().put("GIT_COMMITTER_NAME", "Test Author");
        builder.environment().put("GIT_COMMITTER_EMAIL", "author@example.org");
        builder.redirectInput(ProcessBuilder.Redirect.from(new java.io.File("/dev/null")));
        try {
            Path errFile = Files.createTempFile("git-err", ".txt");
            builder.redirectError(errFile.toFile());
            Process process = builder.start();
            String out = new String(process.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
            int exit = process.waitFor();
            String err = Files.readString(errFile);
            Files.delete(errFile);
            return new Result(exit, out, err);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException(e);
        }
    }

    /** Every mutation point of a file as it is on disk, by every operator. */
    public static List<Point> points(Path projectRoot, String path) {
        try {
            SourceFile source = JavaSources.read(projectRoot, projectRoot.resolve(path));
            return new PointFinder(Operators.named(java.util.List.of("relational-subset", "relational-all"))).find(JavaSources.parse(source));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    public static SourceFile source(Path projectRoot, String path) {
        try {
            return JavaSources.read(projectRoot, projectRoot.resolve(path));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** A small class of our own with comparisons in three methods. */
    public static final String TIDES = """
            package org.tidepool;

            public final class Tides {

                public static boolean isHigh(int level) {
                    return level > 120;
                }

                public static int clamp(int level, int low, int high) {
                    if (level < low) {
                        return low;
                    }
                    if (level > high) {
                        return high;
                    }
                    return level;
                }

                public static int countAbove(int[] levels, int mark) {
                    int count = 0;
                    for (int i = 0; i < levels.length; i++) {
                        if (levels[i] >= mark) {
                            count++;
                        }
                    }
                    return count;
                }
            }
            """;

    /** A second class, so that renames and deletions have something to work on. */
    public static final String BUOY = """
            package org.tidepool;

            final class Buoy {

                private int depth;

                boolean isDeep() {
                    return depth >= 30;
                }

                boolean drifts(int current, int anchorHold) {
                    return current > anchorHold && depth != 0;
                }
            }
            """;
}
