package dev.changeling.cli;

import dev.changeling.terminal.Style;
import picocli.CommandLine.Option;

/** How a command writes: colours or not, and stack traces for internal errors. Every command accepts both. */
final class OutputOptions {

    @Option(names = "--plain", description = "No colours and no progress bar, even on a terminal.")
    boolean plain;

    @Option(names = "--verbose", description = "Stack traces for errors, for a bug report.")
    boolean verbose;

    Style style() {
        return plain ? Style.plain() : Style.forStandardOutput();
    }
}
