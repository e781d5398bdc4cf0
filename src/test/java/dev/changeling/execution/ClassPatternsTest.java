package dev.changeling.execution;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.UserError;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

class ClassPatternsTest {

    static boolean matches(String pattern, String className) {
        return className.matches(ClassPatterns.toRegex(pattern));
    }

    @Nested
    class DefaultIncludes {

        // The default test class patterns of Maven's test plugin: **/Test*.java, **/*Test.java,
        // **/*Tests.java, **/*TestCase.java (Maven Surefire documentation, "includes"; from memory).
        @Test
        void matchEachDefaultShape_inAnyPackage() {
            assertTrue(matches("Test*", "shop.TestPrices"));
            assertTrue(matches("*Test", "shop.PricesTest"));
            assertTrue(matches("*Tests", "shop.deep.PricesTests"));
            assertTrue(matches("*TestCase", "PricesTestCase"));
        }

        @Test
        void doNotMatchOtherNames() {
            assertFalse(matches("*Test", "shop.PriceChecks"));
            assertFalse(matches("*Test", "shop.PricesTestHelper"));
            assertFalse(matches("Test*", "shop.PricesTest"));
        }

        // Maven's test plugin also leaves out **/*$* by default (same documentation, "excludes"; from memory).
        @Test
        void theDefaultExcludeMatchesNestedClassesOnly() {
            assertTrue(matches("*$*", "shop.RatesTest$StaticInnerTest"));
            assertFalse(matches("*$*", "shop.RatesTest"));
        }

        @Test
        void lookAtTheSimpleNameOnly() {
            assertFalse(matches("Test*", "tests.shop.Prices"));
        }
    }

    @Nested
    class QualifiedPatterns {

        @Test
        void singleStarStaysInOnePackage() {
            assertTrue(matches("shop.*Test", "shop.PricesTest"));
            assertFalse(matches("shop.*Test", "shop.deep.PricesTest"));
        }

        @Test
        void doubleStarCrossesPackages_includingNone() {
            assertTrue(matches("shop.**.*IT", "shop.deep.er.PricesIT"));
            assertTrue(matches("shop.**.*IT", "shop.PricesIT"));
            assertFalse(matches("shop.**.*IT", "other.PricesIT"));
        }

        @Test
        void pathsWithAJavaSuffixMeanTheSame() {
            assertEquals(ClassPatterns.toRegex("*Test"), ClassPatterns.toRegex("**/*Test.java"));
            assertTrue(matches("shop/**/*Test.class", "shop.deep.PricesTest"));
        }

        @Test
        void dollarsAndDotsAreLiteral() {
            assertTrue(matches("*$Inner*", "shop.Outer$InnerTest"));
            assertFalse(matches("shop.P*", "shopXPrices"));
        }
    }

    @Nested
    class Mistakes {

        @Test
        void anEmptyPatternIsAUserError() {
            UserError error = assertThrows(UserError.class, () -> ClassPatterns.toRegex(" "));
            assertTrue(error.getMessage().contains("*Test"), error.getMessage());
        }

        @Test
        void doubledDotsAreAUserError() {
            assertThrows(UserError.class, () -> ClassPatterns.toRegex("shop..Test"));
        }
    }
}
