package dev.changeling.samples.apiary;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

/** Named so that only the pom's own include patterns pick it up. */
class HarvestTestCases {

    private final HarvestAdvisor advisor = new HarvestAdvisor(15_000);
    private final Hive linden = new Hive("linden", 21_400);

    @Nested
    class Surplus {

        @Test
        void takesWholeHalfKilosAboveTheWinterStore() {
            // 40,100 - 21,400 tare - 15,000 winter store = 3,700 g -> 3,500 g
            assertEquals(3_500, advisor.harvestableGrams(40_100, linden));
        }

        @Test
        void takesNothingWhenTheStoreIsShort() {
            assertEquals(0, advisor.harvestableGrams(30_000, linden));
        }

        @Test
        void aWinterStoreCannotBeNegative() {
            assertThrows(IllegalArgumentException.class, () -> new HarvestAdvisor(-1));
        }
    }

    @Nested
    class Boxes {

        @Test
        void aStrongFlowWithTwoFreeFramesNeedsAnotherBox() {
            assertTrue(advisor.needsAnotherBox(NectarFlow.STRONG, 2));
        }

        @Test
        void aLightFlowNeverNeedsOne() {
            assertFalse(advisor.needsAnotherBox(NectarFlow.LIGHT, 0));
        }
    }
}
