package dev.changeling.worker;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Unique id layout as the JUnit Platform's {@code UniqueIdFormat} writes it (segments joined by "/"). */
class UniqueIdsTest {

    private static final String CLASS = "[engine:junit-jupiter]/[class:shop.Prices]";
    private static final String METHOD = CLASS + "/[method:adds()]";

    @Test
    void anIdIsWithinItselfAndItsAncestors_notWithinASiblingThatSharesItsPrefix() {
        assertTrue(UniqueIds.isWithin(METHOD, METHOD));
        assertTrue(UniqueIds.isWithin(METHOD, CLASS));
        assertTrue(UniqueIds.isWithin(METHOD, "[engine:junit-jupiter]"));
        assertFalse(UniqueIds.isWithin("[engine:junit-jupiter]/[class:shop.PricesTwo]/[method:adds()]", CLASS));
        assertFalse(UniqueIds.isWithin(CLASS, METHOD));
    }

    @Test
    void theParentIsOneSegmentUp_andAnEngineHasNone() {
        assertEquals(CLASS, UniqueIds.parent(METHOD));
        assertEquals("[engine:junit-jupiter]", UniqueIds.parent(CLASS));
        assertNull(UniqueIds.parent("[engine:junit-jupiter]"));
        assertEquals(CLASS + "/[test-template:doubles(int)]",
                UniqueIds.parent(CLASS + "/[test-template:doubles(int)]/[test-template-invocation:#1]"));
    }
}
