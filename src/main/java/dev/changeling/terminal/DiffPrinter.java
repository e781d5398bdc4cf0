package dev.changeling.terminal;

/** Renders a unified diff for reading: removed lines red, added green, hunk headers cyan. */
public final class DiffPrinter {

    private DiffPrinter() {
    }

    public static String render(String diff, Style style) {
        StringBuilder out = new StringBuilder(diff.length() + 64);
        for (String line : diff.split("\n", -1)) {
            if (line.isEmpty() && out.length() > 0 && out.charAt(out.length() - 1) == '\n') {
                continue;
            }
            String shown = line.endsWith("\r") ? line.substring(0, line.length() - 1) : line;
            if (shown.startsWith("---") || shown.startsWith("+++")) {
                out.append(style.bold(shown));
            } else if (shown.startsWith("@@")) {
                out.append(style.cyan(shown));
            } else if (shown.startsWith("-")) {
                out.append(style.red(shown));
            } else if (shown.startsWith("+")) {
                out.append(style.green(shown));
            } else {
                out.append(shown);
            }
            out.append('\n');
        }
        return out.toString();
    }
}
