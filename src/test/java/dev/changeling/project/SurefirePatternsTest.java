package dev.changeling.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.UserError;
import java.util.List;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

/**
 * The pattern rules checked here are those of Maven Surefire's documentation, "Inclusions and Exclusions of Tests"
 * (maven-surefire-plugin 3.5.4): Ant-style patterns over the test class's path, {@code .java} meaning the compiled
 * class, {@code %regex[…]} matched against the class file's path ({@code .class} ending, {@code /} separators), and
 * the defaults {@code **}{@code /Test*.java, **}{@code /*Test.java, **}{@code /*Tests.java, **}{@code /*TestCase.java}
 * with {@code **}{@code /*$*} excluded.
 */
class SurefirePatternsTest {

    static boolean matches(String pattern, String className) {
        return SurefirePatterns.of(List.of(pattern), "test").matches(SurefirePatterns.classFile(className));
    }

    @Nested
    class Defaults {

        @Test
        void selectTheFourNamingConventions_inAnyPackage() {
            SurefirePatterns defaults = SurefirePatterns.of(SurefirePatterns.DEFAULT_INCLUDES, "test");
            for (String name : List.of("TestCart", "shop.CartTest", "a.b.CartTests", "CartTestCase")) {
                assertTrue(defaults.matches(SurefirePatterns.classFile(name)), name);
            }
            for (String name : List.of("shop.CartTestCaseJava4", "shop.Cart", "shop.CartCheck", "shop.MyTestParamBlockSize")) {
                assertFalse(defaults.matches(SurefirePatterns.classFile(name)), name);
            }
        }

        @Test
        void leaveOutNestedClasses() {
            SurefirePatterns excludes = SurefirePatterns.of(SurefirePatterns.DEFAULT_EXCLUDES, "test");
            assertTrue(excludes.matches(SurefirePatterns.classFile("shop.CartTest$WhenEmpty")));
            assertFalse(excludes.matches(SurefirePatterns.classFile("shop.CartTest")));
        }
    }

    @Nested
    class AntPatterns {

        @Test
        void testStar_selectsNamesWithTestAnywhere() {
            assertTrue(matches("**/*Test*.java", "shop.CartTestCaseJava4"));
            assertTrue(matches("**/*Test*.java", "shop.MyTestParamBlockSize"));
            assertFalse(matches("**/*Test*.java", "shop.Cart"));
        }

        @Test
        void aBareName_matchesInAnyFolder_withOrWithoutEnding() {
            assertTrue(matches("CartTest", "shop.deep.CartTest"));
            assertTrue(matches("CartTest.java", "shop.CartTest"));
            assertTrue(matches("CartTest.class", "shop.CartTest"));
            assertFalse(matches("CartTest", "shop.BigCartTest"));
        }

        @Test
        void aQualifiedName_isAPath() {
            assertTrue(matches("shop.CartTest", "shop.CartTest"));
            assertFalse(matches("shop.CartTest", "other.CartTest"));
        }

        @Test
        void folders_andDoubleStars() {
            assertTrue(matches("**/slow/**", "shop.slow.deep.LoadTest"));
            assertTrue(matches("shop/*/LoadTest.java", "shop.perf.LoadTest"));
            assertFalse(matches("shop/*/LoadTest.java", "shop.perf.deep.LoadTest"));
            assertTrue(matches("**/Load?est.java", "a.LoadTest"));
        }

        @Test
        void commasSeparatePatterns_inOneEntry() {
            SurefirePatterns both = SurefirePatterns.of(List.of("**/A*.java, **/B*.java"), "test");
            assertTrue(both.matches("x/Apple.class"));
            assertTrue(both.matches("x/Banana.class"));
            assertFalse(both.matches("x/Cherry.class"));
        }

        @Test
        void aMethodFilter_selectsTheWholeClass_andIsReported() {
            SurefirePatterns withMethod = SurefirePatterns.of(List.of("**/CartTest.java#addsOne"), "test");
            assertTrue(withMethod.matches("shop/CartTest.class"));
            assertEquals(List.of("**/CartTest.java#addsOne"), withMethod.methodFilters());
        }
    }

    @Nested
    class Regex {

        @Test
        void matchesTheClassFilePath() {
            assertTrue(matches("%regex[.*Field[A-Z][a-z]+Check.*]", "shop.FieldTrialCheck"));
            assertTrue(matches("%regex[shop/perf/.*\\.class]", "shop.perf.LoadTest"));
            assertFalse(matches("%regex[shop\\.perf\\..*]", "shop.perf.LoadTest"), "dots of a class name are slashes in the path");
        }

        @Test
        void keepsCommasInsideBraces() {
            assertTrue(matches("%regex[.*Test\\d{1,2}\\.class]", "shop.CartTest12"));
        }

        @Test
        void anInvalidOne_isAUserError() {
            UserError error = assertThrows(UserError.class, () -> SurefirePatterns.of(List.of("%regex[(unclosed]"), "pom.xml"));
            assertTrue(error.getMessage().startsWith("pom.xml: the test pattern %regex[(unclosed]"), error.getMessage());
        }
    }
}
