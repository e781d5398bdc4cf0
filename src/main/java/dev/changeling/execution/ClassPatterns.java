package dev.changeling.execution;

import dev.changeling.UserError;
import java.util.List;
import java.util.function.Predicate;
import java.util.regex.Pattern;

/**
 * The test class patterns users type ({@code --skip-tests}), matched against binary class names such as
 * {@code com.acme.perf.PerformanceTest} or {@code com.acme.perf.PerformanceTest$Slow}. The rules:
 * <ul>
 *   <li>A pattern without a dot names the simple class name in any package: {@code PerformanceTest}, {@code *IT}.</li>
 *   <li>A pattern with dots names the whole qualified name: {@code com.acme.perf.PerformanceTest}.</li>
 *   <li>{@code *} stands for any characters within one package segment or name, {@code ?} for one such character:
 *       {@code com.acme.*.SlowTest} matches {@code com.acme.db.SlowTest}, not {@code com.acme.db.x.SlowTest}.</li>
 *   <li>{@code **} stands for any number of package segments, none included: {@code com.acme.db.**},
 *       {@code com.acme.**.SlowTest}.</li>
 *   <li>A leading {@code *.} or {@code **.} stands for any package prefix, none included:
 *       {@code *.perf.PerformanceTest} matches {@code com.acme.perf.PerformanceTest} and {@code perf.PerformanceTest}.</li>
 *   <li>A nested class follows its outer class: whatever matches {@code com.acme.Outer} also matches
 *       {@code com.acme.Outer$Inner}; a pattern may also name the nested class itself ({@code Outer$Inner}).</li>
 *   <li>A path is read as a name: {@code /} and {@code \} mean {@code .}, and a {@code .java} or {@code .class}
 *       ending is dropped ({@code **}{@code /perf/*Test.java} is {@code **.perf.*Test}).</li>
 * </ul>
 */
public final class ClassPatterns {

    private static final String ANY_PACKAGE = "(?:.*\\.)?";

    private ClassPatterns() {
    }

    /** Whether a binary class name matches any of the patterns (see the rules above). */
    public static Predicate<String> anyOf(List<String> patterns) {
        List<Predicate<String>> matchers = patterns.stream().map(ClassPatterns::matching).toList();
        return name -> matchers.stream().anyMatch(matcher -> matcher.test(name));
    }

    /** Whether a binary class name, or the name of a class it is nested in, matches the pattern. */
    public static Predicate<String> matching(String pattern) {
        Predicate<String> regex = Pattern.compile(toRegex(pattern)).asMatchPredicate();
        return name -> {
            for (int nested = name.indexOf('$'); nested > 0; nested = name.indexOf('$', nested + 1)) {
                if (regex.test(name.substring(0, nested))) {
                    return true;
                }
            }
            return regex.test(name);
        };
    }

    /** The regular expression one pattern stands for, over the whole binary name. */
    static String toRegex(String pattern) {
        String name = pattern.strip();
        if (name.endsWith(".java") || name.endsWith(".class")) {
            name = name.substring(0, name.lastIndexOf('.'));
        }
        name = name.replace('/', '.').replace('\\', '.');
        boolean anyPackage = !name.contains(".");
        while (name.startsWith("**.") || name.startsWith("*.")) {
            name = name.substring(name.indexOf('.') + 1);
            anyPackage = true;
        }
        if (name.isEmpty() || name.startsWith(".") || name.endsWith(".") || name.contains("..")) {
            throw new UserError("test class pattern '" + pattern + "' is not a class name pattern; write e.g. *Test,"
                    + " com.acme.perf.PerformanceTest or com.acme.**.*IT");
        }
        String body = translate(name);
        return anyPackage ? ANY_PACKAGE + body : body;
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
                regex.append(ANY_PACKAGE);
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
