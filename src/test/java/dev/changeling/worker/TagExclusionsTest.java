package dev.changeling.worker;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.platform.engine.discovery.DiscoverySelectors.selectClass;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.platform.launcher.TestIdentifier;
import org.junit.platform.launcher.TestPlan;
import org.junit.platform.launcher.core.LauncherDiscoveryRequestBuilder;
import org.junit.platform.launcher.core.LauncherFactory;

/** The excluded tags as the worker's baseline applies them, on real Jupiter tests. */
class TagExclusionsTest {

    private static List<String> testsLeftIn(TagExclusions exclusions) {
        TestPlan plan = LauncherFactory.create().discover(LauncherDiscoveryRequestBuilder.request()
                .selectors(selectClass(TaggedFixture.class)).filters(exclusions).build());
        return plan.getRoots().stream().flatMap(root -> plan.getDescendants(root).stream())
                .filter(TestIdentifier::isTest).map(TestIdentifier::getDisplayName).sorted().toList();
    }

    @Test
    void leavesOutWhatAnyExpressionMatches_andNamesTheExpressionsThatLeftSomethingOut() {
        TagExclusions exclusions = new TagExclusions(List.of("no-such-tag", "fixture-slow", "fixture-slow & fixture-db"));

        assertEquals(List.of("untagged()"), testsLeftIn(exclusions));
        assertEquals(List.of("fixture-slow"), exclusions.thatLeftSomethingOut());
    }

    @Test
    void aTagNoTestCarries_leftNothingOut() {
        TagExclusions exclusions = new TagExclusions(List.of("fixture-fast"));

        assertEquals(List.of("slow()", "untagged()"), testsLeftIn(exclusions));
        assertEquals(List.of(), exclusions.thatLeftSomethingOut());
    }
}
