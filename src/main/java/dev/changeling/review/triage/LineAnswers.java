package dev.changeling.review.triage;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;

/** Reads answers line by line from a stream, for scripts and tests. */
final class LineAnswers implements Answers {

    private final BufferedReader in;
    private final PrintWriter out;

    LineAnswers(BufferedReader in, PrintWriter out) {
        this.in = in;
        this.out = out;
    }

    @Override
    public String ask(String prompt) {
        out.print(prompt);
        String line;
        try {
            line = in.readLine();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read the answers", e);
        }
        out.println(line == null ? "" : line);
        out.flush();
        return line;
    }
}
