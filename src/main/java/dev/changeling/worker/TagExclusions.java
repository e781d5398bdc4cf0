package dev.changeling.worker;

import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.platform.engine.FilterResult;
import org.junit.platform.engine.TestDescriptor;
import org.junit.platform.launcher.PostDiscoveryFilter;
import org.junit.platform.launcher.TagFilter;

/**
 * The excluded tag expressions as one discovery filter, which leaves out what any of them matches, as the
 * platform's own exclude filter does, and remembers which expressions left something out: a tag no test
 * carries is a typing mistake the user should hear of.
 */
final class TagExclusions implements PostDiscoveryFilter {

    private final Map<String, PostDiscoveryFilter> filters = new LinkedHashMap<>();
    private final Set<String> used = new LinkedHashSet<>();

    /** @param expressions JUnit Platform tag expressions; a malformed one fails here, as the platform's filter does */
    TagExclusions(List<String> expressions) {
        expressions.forEach(expression -> filters.put(expression, TagFilter.excludeTags(expression)));
    }

    boolean isEmpty() {
        return filters.isEmpty();
    }

    @Override
    public FilterResult apply(TestDescriptor descriptor) {
        List<String> matched = filters.entrySet().stream()
                .filter(filter -> filter.getValue().apply(descriptor).excluded())
                .map(Map.Entry::getKey)
                .toList();
        if (matched.isEmpty()) {
            return FilterResult.included("matches no excluded tag");
        }
        used.addAll(matched);
        return FilterResult.excluded("matches the excluded tags " + String.join(", ", matched));
    }

    /** The expressions that left out at least one test or container so far, in the order given. */
    List<String> thatLeftSomethingOut() {
        return filters.keySet().stream().filter(used::contains).toList();
    }
}
