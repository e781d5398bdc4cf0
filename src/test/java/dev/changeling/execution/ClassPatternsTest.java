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

    /** The forms users type on the command line, matched as {@code --skip-tests} applies them. */
    @Nested
    class TypedForms {

        static boolean skips(String pattern, String className) {
            return ClassPatterns.matching(pattern).test(className);
        }

        @Test
        void leadingStarDot_matchesAnyPackagePrefix() {
            assertTrue(skips("*.perf.PerformanceTest", "com.acme.perf.PerformanceTest"));
            assertTrue(skips("*.perf.PerformanceTest", "perf.PerformanceTest"));
            assertFalse(skips("*.perf.PerformanceTest", "com.acme.db.PerformanceTest"));
        }

        @Test
        void leadingDoubleStarDot_thenAPackage_matchesAnyPackagePrefix() {
            assertTrue(skips("**.perf.*", "com.acme.perf.PerformanceTest"));
            assertTrue(skips("**.perf.*", "perf.LoadTest"));
            assertFalse(skips("**.perf.*", "com.acme.perf.deep.LoadTest"));
            assertFalse(skips("**.perf.*", "com.acme.perfx.LoadTest"));
        }

        @Test
        void simpleName_inAnyPackage() {
            assertTrue(skips("PerformanceTest", "com.acme.perf.PerformanceTest"));
            assertTrue(skips("PerformanceTest", "PerformanceTest"));
            assertFalse(skips("PerformanceTest", "com.acme.perf.PerformanceTests"));
        }

        @Test
        void qualifiedName_exactly() {
            assertTrue(skips("com.acme.perf.PerformanceTest", "com.acme.perf.PerformanceTest"));
            assertFalse(skips("com.acme.perf.PerformanceTest", "org.com.acme.perf.PerformanceTest"));
        }

        @Test
        void starInOneSegment() {
            assertTrue(skips("*IT", "com.acme.db.StoreIT"));
            assertTrue(skips("com.acme.*.SlowTest", "com.acme.db.SlowTest"));
            assertFalse(skips("com.acme.*.SlowTest", "com.acme.db.deep.SlowTest"));
            assertFalse(skips("com.acme.*.SlowTest", "com.acme.SlowTest"));
        }

        @Test
        void doubleStarAcrossPackages() {
            assertTrue(skips("com.acme.db.**", "com.acme.db.StoreTest"));
            assertTrue(skips("com.acme.db.**", "com.acme.db.deep.StoreTest"));
            assertFalse(skips("com.acme.db.**", "com.acme.dbx.StoreTest"));
        }

        @Test
        void nestedClassFollowsItsOuterClass() {
            assertTrue(skips("PerformanceTest", "com.acme.perf.PerformanceTest$Slow"));
            assertTrue(skips("*.perf.PerformanceTest", "com.acme.perf.PerformanceTest$Slow$Slower"));
            assertTrue(skips("com.acme.perf.PerformanceTest", "com.acme.perf.PerformanceTest$Slow"));
            assertTrue(skips("PerformanceTest$Slow", "com.acme.perf.PerformanceTest$Slow"));
            assertFalse(skips("PerformanceTest$Slow", "com.acme.perf.PerformanceTest"));
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
