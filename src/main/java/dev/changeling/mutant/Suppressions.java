package dev.changeling.mutant;

import dev.changeling.UserError;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The project's committed rules for mutants not worth making ({@code .changeling/suppressions.txt}, documented in
 * docs/suppressions-format.md): one rule a line, {@code OPERATOR text|in GLOB -- REASON}. {@code text} matches the
 * host's text (whitespace-normalised), {@code in} the enclosing member's signature; {@code *} in the glob is any
 * run of characters, and {@code *} as the operator is every operator. A point a rule matches is not made, and is
 * counted under its rule.
 */
public final class Suppressions {

    /** Where the rules live, beside the equivalents list. */
    public static final String RELATIVE_PATH = ".changeling/suppressions.txt";

    private static final Pattern RULE = Pattern.compile("(\\S+)\\s+(text|in)\\s+(.+?)\\s+--\\s+(.*\\S)\\s*");

    /** One rule. {@code line} is its line in the file, to name it in counts. */
    record Rule(int line, String operator, boolean onText, Pattern glob, String written, String reason) {

        boolean matches(String pointOperator, String hostText, String member) {
            return (operator.equals("*") || operator.equals(pointOperator))
                    && glob.matcher(onText ? hostText : member).matches();
        }

        String label() {
            return "rule at line " + line + ": " + reason;
        }
    }

    private final List<Rule> rules;

    private Suppressions(List<Rule> rules) {
        this.rules = List.copyOf(rules);
    }

    public static Suppressions none() {
        return new Suppressions(List.of());
    }

    /**
     * The project's rules; none when the file does not exist.
     *
     * @throws UserError naming the file and line of a rule that cannot be read, and what a rule looks like
     */
    public static Suppressions load(Path projectRoot) {
        Path file = projectRoot.resolve(RELATIVE_PATH);
        if (!Files.isRegularFile(file)) {
            return none();
        }
        try {
            return parse(Files.readAllLines(file, StandardCharsets.UTF_8), RELATIVE_PATH);
        } catch (IOException e) {
            throw new UserError(file + ": cannot read the suppression rules (" + e.getMessage() + "); check the file's permissions");
        }
    }

    /**
     * The rules of these lines, as they would be read from the file.
     *
     * @throws UserError naming the file and line of a rule that cannot be read, and what a rule looks like
     */
    public static Suppressions parse(List<String> lines, String fileName) {
        List<Rule> rules = new ArrayList<>();
        for (int i = 0; i < lines.size(); i++) {
            String line = lines.get(i).strip();
            if (line.isEmpty() || line.startsWith("#")) {
                continue;
            }
            Matcher rule = RULE.matcher(line);
            if (!rule.matches()) {
                throw new UserError(fileName + ":" + (i + 1) + ": not a rule; write OPERATOR text|in GLOB -- REASON,"
                        + " e.g. 'statement-removal text metrics.* -- counters only feed dashboards'");
            }
            rules.add(new Rule(i + 1, rule.group(1), rule.group(2).equals("text"), glob(rule.group(3)), rule.group(3),
                    rule.group(4)));
        }
        return new Suppressions(rules);
    }

    /** Why no mutant is made of the point: the first rule that matches it, if any. */
    Optional<String> reason(Point point) {
        return rules.stream().filter(rule -> rule.matches(point.operator(), point.snippet(), point.member()))
                .findFirst().map(Rule::label);
    }

    /** Whether a rule leaves out a point of this operator, host text (whitespace-normalised) and enclosing member. */
    public boolean leavesOut(String operator, String hostText, String member) {
        return rules.stream().anyMatch(rule -> rule.matches(operator, hostText, member));
    }

    /** How many rules there are. */
    public int size() {
        return rules.size();
    }

    public boolean isEmpty() {
        return rules.isEmpty();
    }

    private static Pattern glob(String written) {
        StringBuilder regex = new StringBuilder();
        for (char c : written.toCharArray()) {
            regex.append(switch (c) {
                case '*' -> ".*";
                case '?' -> ".";
                default -> Pattern.quote(String.valueOf(c));
            });
        }
        return Pattern.compile(regex.toString());
    }
}
