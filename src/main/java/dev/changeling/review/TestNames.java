package dev.changeling.review;

import dev.changeling.results.TestRecord;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/** Readable names for the JUnit unique ids a run records: the baseline's name, else one made from the id. */
public final class TestNames {

    private static final Pattern SEGMENT = Pattern.compile("\\[([^:\\]]+):([^\\]]*)\\]");

    private final Map<String, String> byId = new HashMap<>();

    public TestNames(List<TestRecord> tests) {
        if (tests != null) {
            tests.stream().filter(test -> test.name() != null && !test.name().isBlank())
                    .forEach(test -> byId.put(test.id(), test.name()));
        }
    }

    public String of(String id) {
        String known = byId.get(id);
        return known != null ? known : fromId(id);
    }

    /** {@code [engine:x]/[class:a.b.C]/[method:m()]} becomes {@code C > m()}; anything else stays as it is. */
    public static String fromId(String id) {
        List<String> parts = new ArrayList<>();
        Matcher segment = SEGMENT.matcher(id);
        while (segment.find()) {
            String kind = segment.group(1);
            String value = segment.group(2);
            if (kind.equals("engine")) {
                continue;
            }
            parts.add(kind.endsWith("class") ? value.substring(value.lastIndexOf('.') + 1).replace('$', '.') : value);
        }
        return parts.isEmpty() ? id : String.join(" > ", parts);
    }
}
