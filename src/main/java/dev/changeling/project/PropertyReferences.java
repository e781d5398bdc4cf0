package dev.changeling.project;

import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The property references a build setting may still hold once Maven has read the POM: {@code ${name}} (left by
 * Maven when it did not know the name) and {@code @{name}} (Surefire fills it in when the tests start).
 */
final class PropertyReferences {

    private static final Pattern REFERENCE = Pattern.compile("[$@]\\{([^}]+)}");
    /** A property may refer to another; ten rounds end a cycle. */
    private static final int ROUNDS = 10;

    private PropertyReferences() {
    }

    /** The value with every known reference filled in, over several rounds; an unknown one stays as written. */
    static String filled(String value, Map<String, String> properties) {
        String current = value;
        for (int round = 0; round < ROUNDS && hasAny(current); round++) {
            Matcher matcher = REFERENCE.matcher(current);
            StringBuilder result = new StringBuilder();
            while (matcher.find()) {
                String known = properties.get(matcher.group(1));
                matcher.appendReplacement(result, Matcher.quoteReplacement(known == null ? matcher.group() : known));
            }
            matcher.appendTail(result);
            if (result.toString().equals(current)) {
                break;
            }
            current = result.toString();
        }
        return current;
    }

    /** Whether the value still holds a reference. */
    static boolean hasAny(String value) {
        return REFERENCE.matcher(value).find();
    }
}
