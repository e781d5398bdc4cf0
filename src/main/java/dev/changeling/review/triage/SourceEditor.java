package dev.changeling.review.triage;

import dev.changeling.terminal.Style;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Opens a source file at a line in the developer's own editor, {@code $VISUAL}, else {@code $EDITOR}, started as
 * {@code EDITOR +LINE FILE} (the form common editors take) on this terminal; triage waits until it exits.
 */
final class SourceEditor {

    private static final List<String> VARIABLES = List.of("VISUAL", "EDITOR");

    private final Map<String, String> environment;
    private final Path workingFolder;
    private final PrintWriter out;
    private final Style style;

    SourceEditor(Map<String, String> environment, Path workingFolder, PrintWriter out, Style style) {
        this.environment = environment;
        this.workingFolder = workingFolder;
        this.out = out;
        this.style = style;
    }

    /** Whether the editor ran (whatever its exit code); otherwise one line has said why not. */
    boolean open(Path file, String shown, int line) {
        Optional<String> variable = VARIABLES.stream()
                .filter(name -> environment.get(name) != null && !environment.get(name).isBlank()).findFirst();
        if (variable.isEmpty()) {
            out.println(style.yellow("no editor to open " + shown + " in: set $VISUAL or $EDITOR"
                    + " (it is started as: editor +LINE FILE)"));
            return false;
        }
        String editor = environment.get(variable.get()).strip();
        List<String> command = new ArrayList<>(List.of(editor.split("\\s+")));
        command.add("+" + line);
        command.add(file.toAbsolutePath().toString());
        out.println("opening " + shown + ":" + line + " in " + editor + " ($" + variable.get() + "); triage goes on when it exits");
        out.flush();
        int exitCode;
        try {
            exitCode = new ProcessBuilder(command).directory(workingFolder.toFile()).inheritIO().start().waitFor();
        } catch (IOException e) {
            out.println(style.yellow("cannot start the editor '" + editor + "' ($" + variable.get() + "): " + e.getMessage()));
            return false;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            out.println(style.yellow("stopped waiting for the editor"));
            return false;
        }
        if (exitCode != 0) {
            out.println(style.yellow("the editor exited with code " + exitCode));
        }
        return true;
    }
}
