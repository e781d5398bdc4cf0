package dev.changeling.project;

import dev.changeling.UserError;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Predicate;
import java.util.regex.Pattern;
import java.util.regex.PatternSyntaxException;

/**
 * Maven Surefire's test class patterns, applied to the compiled test classes as its own scan applies them:
 * an Ant-style path pattern ({@code **}{@code /*Test.java}, {@code MyTest}, {@code com.shop.CartTest}) is
 * matched against the class file's path below the test classes folder, {@code .java} read as {@code .class}
 * and {@code **}{@code /} put in front; {@code %regex[…]} is a regular expression over that path with
 * {@code /} separators and the {@code .class} ending. An entry may list several patterns, comma-separated.
 */
final class SurefirePatterns {

    /** Surefire's own includes when the pom names none (from version 2.20 on; older versions lack the third). */
    static final List<String> DEFAULT_INCLUDES = List.of("**/Test*.java", "**/*Test.java", "**/*Tests.java", "**/*TestCase.java");
    /** Surefire's own exclude when the pom names none: nested classes, which their enclosing class runs. */
    static final List<String> DEFAULT_EXCLUDES = List.of("**/*$*");

    private final List<Predicate<String>> matchers;
    private final List<String> methodFilters;

    private SurefirePatterns(List<Predicate<String>> matchers, List<String> methodFilters) {
        this.matchers = matchers;
        this.methodFilters = methodFilters;
    }

    /** The patterns of these entries; {@code where} names their origin for the message of a bad one. */
    static SurefirePatterns of(List<String> entries, String where) {
        List<Predicate<String>> matchers = new ArrayList<>();
        List<String> methodFilters = new ArrayList<>();
        for (String entry : entries) {
            for (String pattern : split(entry)) {
                if (pattern.isEmpty()) {
                    continue;
                }
                if (pattern.startsWith("%regex[") && pattern.endsWith("]")) {
                    String body = pattern.substring("%regex[".length(), pattern.length() - 1);
                    int hash = body.indexOf(".class#");
                    if (hash >= 0) {
                        methodFilters.add(pattern);
                        body = body.substring(0, hash + ".class".length());
                    }
                    matchers.add(regex(body, pattern, where).asMatchPredicate());
                    continue;
                }
                String ant = pattern.startsWith("%ant[") && pattern.endsWith("]") ? pattern.substring(5, pattern.length() - 1) : pattern;
                int hash = ant.indexOf('#');
                if (hash >= 0) {
                    methodFilters.add(pattern);
                    ant = ant.substring(0, hash);
                }
                if (!ant.isEmpty()) {
                    Predicate<String> path = antPath(ant).asMatchPredicate();
                    matchers.add(classFile -> path.test(withoutClassEnding(classFile)));
                }
            }
        }
        return new SurefirePatterns(List.copyOf(matchers), List.copyOf(methodFilters));
    }

    boolean isEmpty() {
        return matchers.isEmpty();
    }

    /** Whether any pattern matches the class file's path, such as {@code com/shop/CartTest.class}. */
    boolean matches(String classFile) {
        return matchers.stream().anyMatch(matcher -> matcher.test(classFile));
    }

    /** Patterns that name test methods too ({@code Class#method}); only their class part is honoured. */
    List<String> methodFilters() {
        return methodFilters;
    }

    /** The path of a class's file below the test classes folder: {@code com/shop/CartTest.class}. */
    static String classFile(String binaryName) {
        return binaryName.replace('.', '/') + ".class";
    }

    /** Splits at commas outside brackets, so a regular expression's {@code {1,3}} or {@code [a,b]} stays whole. */
    private static List<String> split(String entry) {
        List<String> parts = new ArrayList<>();
        int depth = 0;
        StringBuilder part = new StringBuilder();
        for (char c : entry.toCharArray()) {
            if (c == '[' || c == '{') {
                depth++;
            } else if ((c == ']' || c == '}') && depth > 0) {
                depth--;
            }
            if (c == ',' && depth == 0) {
                parts.add(part.toString().strip());
                part.setLength(0);
            } else {
                part.append(c);
            }
        }
        parts.add(part.toString().strip());
        return parts;
    }

    private static Pattern regex(String body, String pattern, String where) {
        try {
            return Pattern.compile(body);
        } catch (PatternSyntaxException e) {
            throw new UserError(where + ": the test pattern " + pattern + " is no valid regular expression (" + e.getDescription()
                    + "); fix it in the pom");
        }
    }

    /**
     * An Ant-style path pattern as a regular expression over a class file's path without {@code .class}: a
     * qualified class name becomes a path, the {@code .java}/{@code .class} ending goes, and a pattern that
     * does not start with {@code **}{@code /} matches in any folder.
     */
    static Pattern antPath(String pattern) {
        String path = pattern.strip().replace('\\', '/');
        if (path.endsWith(".java") || path.endsWith(".class")) {
            path = path.substring(0, path.lastIndexOf('.'));
        }
        if (!path.contains("/")) {
            path = path.replace('.', '/');
        }
        if (!path.startsWith("**/")) {
            path = "**/" + (path.startsWith("/") ? path.substring(1) : path);
        }
        StringBuilder regex = new StringBuilder();
        for (int i = 0; i < path.length(); i++) {
            char c = path.charAt(i);
            if (path.startsWith("**/", i)) {
                regex.append("(?:.*/)?");
                i += 2;
            } else if (path.startsWith("**", i)) {
                regex.append(".*");
                i++;
            } else if (c == '*') {
                regex.append("[^/]*");
            } else if (c == '?') {
                regex.append("[^/]");
            } else {
                regex.append(Pattern.quote(String.valueOf(c)));
            }
        }
        return Pattern.compile(regex.toString());
    }

    private static String withoutClassEnding(String classFile) {
        return classFile.endsWith(".class") ? classFile.substring(0, classFile.length() - ".class".length()) : classFile;
    }
}
