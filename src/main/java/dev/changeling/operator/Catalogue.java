package dev.changeling.operator;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The operator catalogue: one markdown file per operator, {@code operators/<id>.md} at the top of the
 * repository and in the jar. A file reads:
 * <pre>
 * # &lt;id&gt;
 *
 * One-line summary.
 *
 * - **Set:** default | on request
 * - **Models:** the fault it stands for
 * - **Reference:** the publication, or "none"
 *
 * ## What it skips            (free text)
 * ## Examples
 * ### &lt;title&gt;
 * ```java                     a complete source file, in the default package
 * ```
 * ```mutants                  one line per expected mutant: original host => mutated host
 * a + b => a - b              (white space does not matter)
 * log(); => (statement removed)
 * a / b => a % b [does not compile]
 * ```
 * </pre>
 * An example without a {@code mutants} block must produce no mutant. The registry's ids decide which
 * files exist, so no index is needed.
 */
public final class Catalogue {

    /** Stands for the empty text a removed statement leaves. */
    public static final String REMOVED = "(statement removed)";
    /** Marks an expected mutant that is known not to compile on its own. */
    public static final String DOES_NOT_COMPILE = "[does not compile]";

    private static final Pattern FACT = Pattern.compile("^- \\*\\*([A-Za-z ]+):\\*\\*\\s*(.*)$");

    /** One operator's entry. */
    public record Entry(String id, String summary, Map<String, String> facts, List<Example> examples, String text) {

        public boolean isDefault() {
            return "default".equals(facts.get("Set"));
        }

        public String set() {
            return facts.getOrDefault("Set", "");
        }
    }

    /** A worked example: a source file and the mutants the operator must make of it, no more and no fewer. */
    public record Example(String title, int line, String source, List<ExpectedMutant> mutants) {
    }

    /** One expected mutant: the host's original and mutated text ({@code ""} for a removed statement). */
    public record ExpectedMutant(String original, String mutated, boolean compiles) {
    }

    private Catalogue() {
    }

    /** The entries of every registered operator, in registry order. */
    public static List<Entry> all() {
        return Operators.all().stream().map(operator -> entry(operator.id())).toList();
    }

    /** The packaged entry of one operator. */
    public static Entry entry(String id) {
        String resource = "/operators/" + id + ".md";
        try (InputStream in = Catalogue.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("the catalogue entry " + resource + " is missing from the build");
            }
            return parse(id, new String(in.readAllBytes(), StandardCharsets.UTF_8));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + resource, e);
        }
    }

    /** Parses an entry; a malformed file fails with its line number. */
    public static Entry parse(String id, String markdown) {
        return new Parser(id, markdown).entry();
    }

    /** Reads one file line by line. */
    private static final class Parser {

        private final String id;
        private final String text;
        private final String[] lines;
        private int at;

        Parser(String id, String text) {
            this.id = id;
            this.text = text;
            this.lines = text.split("\r?\n", -1);
        }

        Entry entry() {
            skipBlank();
            expect(at < lines.length && lines[at].equals("# " + id), "the file must start with '# " + id + "'");
            at++;
            String summary = null;
            Map<String, String> facts = new LinkedHashMap<>();
            List<Example> examples = new ArrayList<>();
            String section = "";
            for (; at < lines.length; at++) {
                String line = lines[at];
                Matcher fact = FACT.matcher(line);
                if (line.startsWith("## ")) {
                    section = line.substring(3).trim();
                } else if (section.equals("Examples") && line.startsWith("### ")) {
                    examples.add(example(line.substring(4).trim()));
                } else if (section.isEmpty() && fact.matches()) {
                    facts.put(fact.group(1), fact.group(2).trim());
                } else if (section.isEmpty() && summary == null && !line.isBlank()) {
                    summary = line.trim();
                    expect(at + 1 >= lines.length || lines[at + 1].isBlank(), "the summary must be one line");
                }
            }
            expect(summary != null, "no summary line after the heading");
            String set = facts.get("Set");
            expect("default".equals(set) || "on request".equals(set), "'- **Set:**' must say 'default' or 'on request'");
            return new Entry(id, summary, Map.copyOf(facts), List.copyOf(examples), text);
        }

        /** Reads from a {@code ###} heading up to the next heading; leaves {@code at} on the example's last line. */
        private Example example(String title) {
            int start = at + 1;
            String source = null;
            List<ExpectedMutant> mutants = null;
            for (at++; at < lines.length && !lines[at].startsWith("#"); at++) {
                String fence = lines[at].trim();
                if (fence.equals("```java") && source == null) {
                    source = String.join("\n", block()) + "\n";
                } else if (fence.equals("```mutants") && mutants == null) {
                    mutants = block().stream().filter(line -> !line.isBlank()).map(this::expected).toList();
                } else if (fence.startsWith("```")) {
                    block();
                }
            }
            at--;
            expect(source != null, "the example '" + title + "' (line " + start + ") has no ```java block");
            return new Example(title, start, source, mutants == null ? List.of() : mutants);
        }

        /** The lines of the fenced block opening at {@code at}; leaves {@code at} on its closing fence. */
        private List<String> block() {
            int open = at;
            List<String> body = new ArrayList<>();
            for (at++; at < lines.length && !lines[at].trim().equals("```"); at++) {
                body.add(lines[at]);
            }
            expect(at < lines.length, "the block opened on line " + (open + 1) + " is never closed");
            return body;
        }

        private ExpectedMutant expected(String line) {
            String body = line.trim();
            boolean compiles = !body.endsWith(DOES_NOT_COMPILE);
            if (!compiles) {
                body = body.substring(0, body.length() - DOES_NOT_COMPILE.length()).trim();
            }
            int arrow = body.indexOf(" => ");
            expect(arrow > 0, "an expected mutant reads 'original => mutated', not '" + line.trim() + "'");
            String mutated = body.substring(arrow + 4).trim();
            return new ExpectedMutant(body.substring(0, arrow).trim(), mutated.equals(REMOVED) ? "" : mutated, compiles);
        }

        private void skipBlank() {
            while (at < lines.length && lines[at].isBlank()) {
                at++;
            }
        }

        private void expect(boolean condition, String message) {
            if (!condition) {
                throw new IllegalArgumentException("operators/" + id + ".md:" + Math.min(at + 1, lines.length) + ": " + message);
            }
        }
    }
}
