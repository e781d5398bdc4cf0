package dev.changeling.review.triage;

import dev.changeling.mutant.Suppressions;
import dev.changeling.review.IdPrefix;
import dev.changeling.review.SuppressionProposal;
import dev.changeling.terminal.Style;
import java.util.Arrays;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Collectors;

/** The answers triage takes: one letter each, then Enter; its label for the prompt and its line for the help screen. */
enum Choice {
    EQUIVALENT('e', "equivalent",
            "No test could tell it from the original. Asks why (required); or give the reason after the letter:"
                    + " e <reason>. On a proposed equivalent (it compiled to the original's classes), e alone lists it with that"
                    + " reason. Goes into the committed list .changeling/equivalent-mutants.txt."),
    NEEDS_TEST('t', "needs a test",
            "A test should notice it; one is still to be written. An optional note may follow: t <note>."
                    + " Kept on this machine in .changeling/local/triage.json."),
    FIXED('f', "fixed",
            "Runs this mutant again now, against the code and tests as they are, saying each step as it starts."
                    + " Recorded as fixed only when a test now detects it; if it still survives, nothing is recorded."),
    UNDO('u', "undo",
            "Clears the decision recorded for this survivor: its entry in the equivalents list, or its local mark;"
                    + " saved at once. Nothing else recorded changes."),
    SKIP('s', "skip", "Leave it without a decision for now and go on; after the last survivor, round again from the first"
            + " still without one (says so and waits when there is none). The next triage starts at it again."),
    BACK('b', "back", "Go back to the previous survivor (its decision so far is shown; a new one replaces it)."),
    GO_TO('g', "go to",
            "Goes to the survivor whose id starts with the digits after the letter: g <id>, at least "
                    + IdPrefix.MIN_LENGTH + " of them (l shows the ids)."),
    LIST('l', "list",
            "Lists every unresolved survivor, one line each: id, file:line, operator and the decision if any;"
                    + " then back to this one."),
    CONTEXT('c', "context",
            "More lines around the change, from the file as it is now (wider each time); says so when the file"
                    + " has changed since the run."),
    OPEN('o', "open",
            "Opens the file at the mutated line in $VISUAL, else $EDITOR (started as: editor +LINE FILE) on this"
                    + " terminal; triage goes on when the editor exits."),
    QUIT('q', "quit", "Stop. Every decision is already saved; the next triage starts at the first survivor without one."),
    HELP('?', "help", "This list.");

    /** An answer read: the choice and any text after its letter. */
    record Answer(Choice choice, String text) {
    }

    private final char key;
    private final String label;
    private final String help;

    Choice(char key, String label, String help) {
        this.key = key;
        this.label = label;
        this.help = help;
    }

    char key() {
        return key;
    }

    String label() {
        return label;
    }

    String help() {
        return help;
    }

    /** The line the developer typed as a choice, or empty when it is none. */
    static Optional<Answer> parse(String line) {
        String trimmed = line.strip();
        if (trimmed.isEmpty() || (trimmed.length() > 1 && !Character.isWhitespace(trimmed.charAt(1)))) {
            return Optional.empty();
        }
        char typed = trimmed.toLowerCase(Locale.ROOT).charAt(0);
        return Arrays.stream(values())
                .filter(choice -> choice.key == typed)
                .findFirst()
                .map(choice -> new Answer(choice, trimmed.substring(1).strip()));
    }

    /** Every choice with what it does, for {@code ?}. */
    static String helpScreen(Style style) {
        StringBuilder screen = new StringBuilder("Answer with one letter, then Enter (e, t and g take words after it):\n");
        for (Choice choice : values()) {
            screen.append("  ").append(style.bold(String.valueOf(choice.key))).append("  ")
                    .append(choice.label).append(": ").append(choice.help).append('\n');
        }
        screen.append("When a listing makes it ").append(SuppressionProposal.MARKS_NEEDED)
                .append(" equivalents of one operator on calls of one method, triage shows the suppression rule that would")
                .append(" stop making them and asks once: ").append(style.bold(String.valueOf(RuleOffer.ADD)))
                .append(" adds it to ").append(Suppressions.RELATIVE_PATH).append(" (from the next run on), ")
                .append(style.bold(String.valueOf(RuleOffer.NOT_NOW))).append(" leaves it out for this session.\n");
        return screen.append("Only survived mutants that are not listed as equivalent or marked fixed are shown.")
                .append(" Every decision is written the moment it is made, so quitting or Ctrl-C loses none.\n")
                .toString();
    }

    /** The choices as the prompt lists them. */
    static String menu() {
        return Arrays.stream(values()).map(choice -> choice.key + " " + choice.label).collect(Collectors.joining("  "));
    }
}
