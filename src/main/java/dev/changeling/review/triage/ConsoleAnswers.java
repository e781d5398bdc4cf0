package dev.changeling.review.triage;

import java.io.Console;
import java.io.PrintWriter;

/** Reads answers typed at the terminal, a line at a time, so it works the same in every terminal and multiplexer. */
final class ConsoleAnswers implements Answers {

    private final Console console;
    private final PrintWriter out;

    ConsoleAnswers(Console console, PrintWriter out) {
        this.console = console;
        this.out = out;
    }

    @Override
    public String ask(String prompt) {
        out.print(prompt);
        out.flush();
        return console.readLine();
    }
}
