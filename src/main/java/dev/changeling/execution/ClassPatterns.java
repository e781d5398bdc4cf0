package dev.changeling.execution;

import dev.changeling.UserError;
import java.util.List;
import java.util.function.Predicate;
import java.util.regex.Pattern;

/** Turns the test class name patterns users write into the regular expressions the JUnit Platform filters by. */
public final class ClassPatterns {

    private ClassPatterns() {
    }

    /** Whether a fully qualified class name matches any of the patterns (see {@link #toRegex}). */
    public static Predicate<String> anyOf(List<String> patterns) {
        List<Predicate<String>> matchers = patterns.stream().map(pattern -> Pattern.compile(toRegex(pattern)).asMatchPredicate()).toList();
        return name -> matchers.stream().anyMatch(matcher -> matcher.test(name));
    }

    /**
     * {@code *Test} matches simple names ending in Test in any package; {@code com.shop.*Test} matches
     * in that package only; {@code **} matches across dots; {@code **}{@code /*Test.java} is read as a
     * path and means the same as {@code *Test}.
     */
    static String toRegex(String pattern) {
        String name = pattern.strip();
        if (name.endsWith(".java") || name.endsWith(".class")) {
            name = name.substring(0, name.lastIndexOf('.'));
        }
        name = name.replace('/', '.').replace('\\', '.');
        while (name.startsWith("**.")) {
            name = name.substring(3);
        }
        if (name.isEmpty() || name.startsWith(".") || name.endsWith(".") || name.contains("..")) {
            throw new UserError("test class pattern '" + pattern + "' is not a class name pattern; write e.g. *Test or com.shop.**.*IT");
        }
        String body = translate(name);
        return name.contains(".") ? body : "(?:.*\\.)?" + body;
    }

    private static String translate(String glob) {
        StringBuilder regex = new StringBuilder();
        StringBuilder literal = new StringBuilder();
        for (int i = 0; i < glob.length(); i++) {
            char c = glob.charAt(i);
            if (c != '*' && c != '?') {
                literal.append(c);
                continue;
            }
            if (literal.length() > 0) {
                regex.append(Pattern.quote(literal.toString()));
                literal.setLength(0);
            }
            if (c == '?') {
                regex.append("[^.]");
            } else if (glob.startsWith("**.", i)) {
                regex.append("(?:.*\\.)?");
                i += 2;
            } else if (glob.startsWith("**", i)) {
                regex.append(".*");
                i++;
            } else {
                regex.append("[^.]*");
            }
        }
        if (literal.length() > 0) {
            regex.append(Pattern.quote(literal.toString()));
        }
        return regex.toString();
    }
}
