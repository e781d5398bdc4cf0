package dev.changeling.worker;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/** Tests with tags for {@link TagExclusionsTest}; the name keeps the build's test run from picking them up itself. */
public class TaggedFixture {

    @Test
    @Tag("fixture-slow")
    void slow() {
        assertEquals(4, 2 + 2);
    }

    @Test
    void untagged() {
        assertEquals(4, 2 + 2);
    }
}
