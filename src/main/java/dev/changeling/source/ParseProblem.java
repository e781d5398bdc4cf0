package dev.changeling.source;

/** A file that could not be parsed: reported as {@code file:line: message} and skipped. */
public record ParseProblem(String path, int line, String message) {

    @Override
    public String toString() {
        return path + ":" + line + ": " + message;
    }
}
