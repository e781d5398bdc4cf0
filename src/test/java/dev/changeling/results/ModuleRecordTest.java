package dev.changeling.results;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

class ModuleRecordTest {

    @Test
    void aModuleHoldsTheFilesBelowItsFolder_notThoseOfAModuleWhoseNameStartsTheSame() {
        ModuleRecord core = new ModuleRecord("parts/core", List.of());

        assertTrue(core.holds("parts/core/src/main/java/Dock.java"));
        assertFalse(core.holds("parts/core-extra/src/main/java/Dock.java"));
        assertFalse(core.holds("app/src/main/java/Dock.java"));
    }

    @Test
    void theOnlyModuleOfAProject_holdsEveryFile() {
        assertTrue(new ModuleRecord("", List.of()).holds("src/main/java/Dock.java"));
    }

    @Test
    void twoModulesComparisons_addUpAsOne() {
        CompiledAlike core = new CompiledAlike(Map.of("a1", "bytes"), List.of(List.of("a2", "a3")), 4);
        CompiledAlike app = new CompiledAlike(Map.of("b1", "shape"), List.of(), 2);

        CompiledAlike both = core.plus(app);

        assertEquals(Map.of("a1", "bytes", "b1", "shape"), both.asOriginal());
        assertEquals(List.of(List.of("a2", "a3")), both.duplicates());
        assertEquals(6, both.compared());
        assertEquals(core, core.plus(CompiledAlike.NONE));
    }
}
