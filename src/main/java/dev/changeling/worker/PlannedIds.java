package dev.changeling.worker;

import java.util.HashSet;
import java.util.Set;
import org.junit.platform.launcher.TestIdentifier;
import org.junit.platform.launcher.TestPlan;

/**
 * The unique ids a discovered plan holds, to tell whether a selected test will run. Parameterised and
 * dynamic tests appear only while they run, so an id missing from the plan may yet be registered below a
 * container that has no tests yet. Below a container that does have tests, or below none at all, the id
 * selects nothing: engines report such a selector as a failure of their own (a stand-in test, a failed
 * engine), which must not count as a kill, so such an id is not run.
 */
final class PlannedIds {

    private final Set<String> all = new HashSet<>();
    private final Set<String> containersBelowEngines = new HashSet<>();
    private final Set<String> holdingTests = new HashSet<>();

    private PlannedIds() {
    }

    static PlannedIds of(TestPlan plan) {
        PlannedIds ids = new PlannedIds();
        for (TestIdentifier engine : plan.getRoots()) {
            ids.all.add(engine.getUniqueId());
            for (TestIdentifier node : plan.getDescendants(engine)) {
                ids.all.add(node.getUniqueId());
                if (node.isContainer()) {
                    ids.containersBelowEngines.add(node.getUniqueId());
                }
                if (node.isTest()) {
                    for (TestIdentifier up = node; up.getParentId().isPresent(); up = plan.getTestIdentifier(up.getParentId().get())) {
                        ids.holdingTests.add(up.getParentId().get());
                    }
                }
            }
        }
        return ids;
    }

    /** Whether the plan has this test, or its nearest container in the plan has no tests yet and may register it. */
    boolean mayHold(String uniqueId) {
        if (all.contains(uniqueId)) {
            return true;
        }
        for (String ancestor = UniqueIds.parent(uniqueId); ancestor != null; ancestor = UniqueIds.parent(ancestor)) {
            if (all.contains(ancestor)) {
                return containersBelowEngines.contains(ancestor) && !holdingTests.contains(ancestor);
            }
        }
        return false;
    }
}
