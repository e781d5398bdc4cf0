package dev.changeling.review.triage;

import java.io.BufferedReader;
import java.io.Console;
import java.io.PrintWriter;
import java.io.Reader;

/** Where the developer's answers come from: a terminal, or lines of a script. */
public interface Answers {

    /** Shows the prompt and returns the line given, without its line end; null when the input has ended. */
    String ask(String prompt);

    /** Answers typed at a terminal, the prompt written to {@code out} (which goes to the same terminal). */
    static Answers fromConsole(Console console, PrintWriter out) {
        return new ConsoleAnswers(console, out);
    }

    /** Answers read line by line, each echoed after its prompt so that the output reads like a session. */
    static Answers fromLines(Reader in, PrintWriter out) {
        return new LineAnswers(in instanceof BufferedReader buffered ? buffered : new BufferedReader(in), out);
    }
}
