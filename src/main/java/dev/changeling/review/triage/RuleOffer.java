package dev.changeling.review.triage;

import dev.changeling.UserError;
import dev.changeling.mutant.Suppressions;
import dev.changeling.results.MutantResult;
import dev.changeling.review.EquivalentEntry;
import dev.changeling.review.EquivalentsList;
import dev.changeling.review.SuppressionProposal;
import dev.changeling.review.SuppressionsFile;
import dev.changeling.terminal.Style;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;

/**
 * After a survivor is listed as equivalent: when the list now argues for a suppression rule
 * ({@link SuppressionProposal}), shows the line and asks once whether to add it to the suppressions file.
 */
final class RuleOffer {

    /** The key that adds the proposed rule. */
    static final char ADD = 'a';
    /** The key that leaves it out, for the rest of the session. */
    static final char NOT_NOW = 'n';

    private final Path projectRoot;
    private final Answers answers;
    private final PrintWriter out;
    private final Style style;
    private final Set<SuppressionProposal.Kind> declined = new HashSet<>();

    RuleOffer(Path projectRoot, Answers answers, PrintWriter out, Style style) {
        this.projectRoot = projectRoot;
        this.answers = answers;
        this.out = out;
        this.style = style;
    }

    /** Proposes a rule if the mutant just listed completes the case for one; false when the input ended meanwhile. */
    boolean afterEquivalent(MutantResult mutant) {
        Optional<SuppressionProposal> proposal;
        try {
            proposal = proposal(mutant).filter(found -> !declined.contains(found.kind()));
        } catch (UserError e) {
            out.println(style.yellow("no suppression rule proposed: " + e.getMessage()));
            return true;
        }
        return proposal.map(this::ask).orElse(true);
    }

    private Optional<SuppressionProposal> proposal(MutantResult mutant) {
        EquivalentsList list = EquivalentsList.load(projectRoot);
        Optional<EquivalentEntry> marked = list.find(mutant.id());
        return marked.flatMap(entry -> SuppressionProposal.after(entry, list.entries(), Suppressions.load(projectRoot)));
    }

    private boolean ask(SuppressionProposal proposal) {
        String file = Suppressions.RELATIVE_PATH;
        out.println(proposal.kind().operator() + " on calls of " + proposal.kind().call().callee() + " is now listed as equivalent "
                + proposal.evidence().size() + " times; a rule in " + file + " would stop making such mutants from the next run on:");
        out.println("  " + style.bold(proposal.line()));
        while (true) {
            String line = answers.ask(prompt());
            if (line == null) {
                out.println("end of input: no rule added");
                return false;
            }
            String answer = line.strip().toLowerCase(Locale.ROOT);
            if (answer.equals(String.valueOf(ADD))) {
                add(proposal);
                return true;
            }
            if (answer.equals(String.valueOf(NOT_NOW))) {
                declined.add(proposal.kind());
                out.println("no rule added; triage will not propose it again in this session");
                return true;
            }
            if (!answer.isEmpty()) {
                out.println("answer " + ADD + " to add the rule or " + NOT_NOW + " to leave it out");
            }
        }
    }

    /** What the question shows: the two keys and what each does. */
    static String prompt() {
        return ADD + " add this line to " + Suppressions.RELATIVE_PATH + "  " + NOT_NOW + " not now > ";
    }

    private void add(SuppressionProposal proposal) {
        try {
            SuppressionsFile.append(projectRoot, proposal.line());
        } catch (UserError e) {
            out.println(style.red("no rule added: " + e.getMessage()));
            return;
        }
        out.println(style.green("added the rule to " + Suppressions.RELATIVE_PATH + "; it takes effect from the next run"
                + " (the mutants listed stay on the equivalents list)"));
    }
}
