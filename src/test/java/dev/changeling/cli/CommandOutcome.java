package dev.changeling.cli;

import java.io.PrintWriter;
import java.io.StringWriter;

/** A command line run in process, as the binary would run it: its exit code and what it wrote to each stream. */
record CommandOutcome(int code, String out, String err) {

    static CommandOutcome of(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.execute(new PrintWriter(out, true), new PrintWriter(err, true), args);
        return new CommandOutcome(code, out.toString(), err.toString());
    }
}
