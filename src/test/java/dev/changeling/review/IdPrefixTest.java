package dev.changeling.review;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.changeling.UserError;
import java.util.List;
import java.util.function.Function;
import org.junit.jupiter.api.Test;

class IdPrefixTest {

    static final List<String> IDS = List.of("3fa2c01d9e7b4a55", "3fa2d7700b1c9e02", "81be44f0aa5d3c19");

    static String single(String typed) {
        return IdPrefix.single(typed, IDS, Function.identity(), "here", "look again");
    }

    @Test
    void prefixOfOne_namesIt_whateverItsCase() {
        assertEquals("81be44f0aa5d3c19", single("81BE"));
        assertEquals("3fa2d7700b1c9e02", single("3fa2d"));
    }

    @Test
    void prefixOfSeveral_namesThemAndAsksForMoreDigits() {
        UserError error = assertThrows(UserError.class, () -> single("3fa2"));

        assertEquals("id 3fa2 fits 2 mutants (3fa2c01d9e7b, 3fa2d7700b1c); give more digits", error.getMessage());
    }

    @Test
    void prefixOfNone_saysWhereItLookedAndTheHint() {
        UserError error = assertThrows(UserError.class, () -> single("ffff"));

        assertEquals("no mutant ffff here; look again", error.getMessage());
    }

    @Test
    void tooShortOrNotHex_isNotAnId() {
        assertEquals("'3fa' is not a mutant id; give at least 4 of its hex digits",
                assertThrows(UserError.class, () -> single("3fa")).getMessage());
        assertEquals("'beacon' is not a mutant id; give at least 4 of its hex digits",
                assertThrows(UserError.class, () -> single("beacon")).getMessage());
    }
}
