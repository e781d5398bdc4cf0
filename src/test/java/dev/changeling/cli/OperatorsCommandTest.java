package dev.changeling.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.ExitCode;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

class OperatorsCommandTest {

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        return Main.execute(new PrintWriter(out), new PrintWriter(err), args);
    }

    @Test
    void listsEveryOperator_withItsSetAndSummary() {
        assertEquals(ExitCode.OK, run("operators"));
        String listing = out.toString();
        assertTrue(listing.matches("(?s)relational-subset +default +Replaces a comparison by the three changes that subsume the other four \\(< by <=, != and false, and so on\\)\\.\n.*"), listing);
        assertTrue(listing.matches("(?s).*\nrelational-all +on request +Replaces a comparison by each of the other five.*"), listing);
        assertTrue(listing.matches("(?s).*\nstatement-removal +default +Removes a statement that is a method call or an assignment\\.\n.*"), listing);
        assertEquals(dev.changeling.operator.Operators.all().size() + 2, listing.lines().count(), listing);
        assertEquals("", err.toString());
    }

    @Test
    void detailsPrintTheWholeEntry() throws Exception {
        assertEquals(ExitCode.OK, run("operators", "--details", "arithmetic-swap"));
        assertEquals(Files.readString(Path.of("operators/arithmetic-swap.md")), out.toString());
    }

    @Test
    void detailsOfAnUnknownOperator_isAUserError() {
        assertEquals(ExitCode.USER_ERROR, run("operators", "--details", "no-such-swap"));
        assertEquals("changeling: --details: no operator 'no-such-swap'; 'changeling operators' lists them\n",
                err.toString().replace(System.lineSeparator(), "\n"));
        assertEquals("", out.toString());
    }
}
