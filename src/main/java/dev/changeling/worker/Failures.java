package dev.changeling.worker;

/** Turns a test's failure into the short line shown beside a killed mutant. */
final class Failures {

    static final int LIMIT = 300;

    private Failures() {
    }

    /** The exception's simple class name and the first line of its message, cut to a readable length. */
    static String describe(Throwable failure) {
        String name = failure.getClass().getSimpleName().isEmpty() ? failure.getClass().getName() : failure.getClass().getSimpleName();
        String message = failure.getMessage();
        String text = message == null || message.isBlank() ? name : name + ": " + firstLine(message.strip());
        return text.length() <= LIMIT ? text : text.substring(0, LIMIT - 1) + "…";
    }

    private static String firstLine(String text) {
        int end = text.indexOf('\n');
        return (end < 0 ? text : text.substring(0, end)).stripTrailing();
    }
}
