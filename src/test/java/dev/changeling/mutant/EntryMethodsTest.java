package dev.changeling.mutant;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.mutant.EntryMethods.EntryMethod;
import dev.changeling.source.SourceFile;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Which methods a schema notes the entry of: those of named types whose bodies hold no code that can run after they
 * return (a lambda, an anonymous or a local class), named so that an edit of any body keeps every name.
 */
class EntryMethodsTest {

    private static final String LEDGER = """
            package shed;

            import java.util.List;
            import java.util.function.IntSupplier;

            class Ledger {
                private int total = 3;

                Ledger() {
                    total = 4;
                }

                int total() {
                    return total;
                }

                int plus(int a, List<String> names) {
                    return a + names.size();
                }

                abstract static class Shelf {
                    abstract int width();

                    int twice() {
                        return 2 * width();
                    }
                }

                IntSupplier later() {
                    return () -> total;
                }

                Runnable anonymous() {
                    return new Runnable() {
                        public void run() {
                            total++;
                        }
                    };
                }

                int local() {
                    class Counter {
                        int count() {
                            return 1;
                        }
                    }
                    return new Counter().count();
                }

                enum Season {
                    WINTER {
                        int days() {
                            return 90;
                        }
                    };

                    int days() {
                        return 91;
                    }
                }

                interface Sized {
                    int size();

                    default boolean empty() {
                        return size() == 0;
                    }
                }
            }
            """;

    private static List<String> names(String text) {
        return EntryMethods.of(SourceFile.of("src/shed/Ledger.java", text)).stream().map(EntryMethod::name).toList();
    }

    @Test
    void methodsOfNamedTypesWithBodies_areNoted_andThoseWithCodeThatRunsLater_orInUnnamedTypes_areNot() {
        assertEquals(List.of("src/shed/Ledger.java#Ledger.total()", "src/shed/Ledger.java#Ledger.plus(int,List<String>)",
                "src/shed/Ledger.java#Ledger.Shelf.twice()", "src/shed/Ledger.java#Ledger.Season.days()",
                "src/shed/Ledger.java#Ledger.Sized.empty()"), names(LEDGER));
    }

    @Test
    void eachNoteGoesJustInsideItsMethodsOpeningBrace() {
        SourceFile file = SourceFile.of("src/shed/Ledger.java", LEDGER);
        for (EntryMethod method : EntryMethods.of(file)) {
            assertEquals('{', LEDGER.charAt(method.noteAt() - 1), method.name());
            assertEquals('}', LEDGER.charAt(method.body().end() - 1), method.name());
        }
    }

    @Test
    void anEditOfABody_keepsEveryNameAndTheSkeleton_whileAnEditOutsideTheBodiesChangesTheSkeleton() {
        String bodyEdited = LEDGER.replace("return a + names.size();", "int size = names.size();\n        return a + size;");
        String fieldEdited = LEDGER.replace("private int total = 3;", "private int total = 5;");
        String constructorEdited = LEDGER.replace("total = 4;", "total = 6;");
        assertEquals(names(LEDGER), names(bodyEdited));
        assertEquals(skeleton(LEDGER), skeleton(bodyEdited));
        assertNotEquals(skeleton(LEDGER), skeleton(fieldEdited));
        assertNotEquals(skeleton(LEDGER), skeleton(constructorEdited), "a constructor is not noted, so it is part of the skeleton");
        assertNotEquals(skeleton(LEDGER), skeleton(LEDGER.replace("return () -> total;", "return () -> total + 1;")),
                "a method holding a lambda is not noted, so its body is part of the skeleton");
    }

    @Test
    void theSkeletonLeavesOutExactlyTheNotedBodies() {
        String skeleton = skeleton(LEDGER);
        assertTrue(skeleton.contains("int plus(int a, List<String> names) {}"), skeleton);
        assertTrue(skeleton.contains("return () -> total;"), skeleton);
        assertTrue(skeleton.contains("abstract int width();"), skeleton);
        assertEquals(-1, skeleton.indexOf("return 91;"), skeleton);
        assertTrue(skeleton.contains("return 90;"), "a method of an enum constant's body is in an unnamed class: " + skeleton);
    }

    private static String skeleton(String text) {
        SourceFile file = SourceFile.of("src/shed/Ledger.java", text);
        return EntryMethods.skeleton(file, EntryMethods.of(file));
    }
}
