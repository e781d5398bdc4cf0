package dev.changeling.worker;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Tests for {@link SuiteTest} to run through the worker's own suite; the name keeps the build's test run
 * from picking them up itself.
 */
public class TogetherFixture {

    @Test
    void plain() {
        assertEquals(4, 2 + 2);
    }

    @ParameterizedTest
    @ValueSource(ints = {1, 2, 3})
    void positive(int number) {
        assertTrue(number > 0);
    }

    @ParameterizedTest
    @ValueSource(ints = {1, -2})
    void positiveOrNot(int number) {
        assertTrue(number > 0);
    }
}
