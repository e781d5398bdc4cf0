package dev.changeling.terminal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.changeling.review.KillGrid;
import dev.changeling.review.TestNames;
import java.util.List;
import org.junit.jupiter.api.Test;

class KillShadesTest {

    @Test
    void shades_byShareOfTheLargestCount() {
        assertEquals(" ", KillShades.shade(0, 8));
        assertEquals("░", KillShades.shade(1, 8));
        assertEquals("░", KillShades.shade(2, 8));
        assertEquals("▒", KillShades.shade(3, 8));
        assertEquals("▓", KillShades.shade(6, 8));
        assertEquals("█", KillShades.shade(7, 8));
        assertEquals("█", KillShades.shade(8, 8));
    }

    @Test
    void plain_aRowPerTest_lettersForOperators_theRestCounted() {
        KillGrid grid = new KillGrid(List.of("arithmetic-swap", "relational-subset"),
                List.of(new KillGrid.Row("[engine:junit-jupiter]/[class:shop.TillTest]/[method:totals()]", List.of(4, 1)),
                        new KillGrid.Row("[engine:junit-jupiter]/[class:shop.TillTest]/[method:change()]", List.of(0, 2))),
                3, 5, true);

        List<String> lines = new KillShades(Style.plain()).render(grid, new TestNames(List.of()));

        String pad = " ".repeat(44);
        assertEquals(List.of(
                "  " + pad + " A B",
                "  TillTest > totals()" + " ".repeat(44 - 19) + " █ ░  5",
                "  TillTest > change()" + " ".repeat(44 - 19) + "   ▒  2",
                "  …and 3 more tests with 5 kills",
                "  A arithmetic-swap  B relational-subset",
                "  (a lower bound: the run stopped at each mutant's first failing test)"), lines);
    }

    @Test
    void noKills_sayItInOneLine() {
        assertEquals(List.of("  no test killed a mutant"),
                new KillShades(Style.plain()).render(new KillGrid(List.of("a"), List.of(), 0, 0, false), new TestNames(List.of())));
    }
}
