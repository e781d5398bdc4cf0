package dev.changeling.review.triage;

import dev.changeling.review.TestNames;
import dev.changeling.UserError;
import dev.changeling.results.MutantResult;
import dev.changeling.results.Verdict;
import dev.changeling.terminal.Style;
import java.io.PrintWriter;

/** Checks a fix the developer claims by running the mutant again, and records it as fixed only when a test now detects it. */
final class FixCheck {

    private final MutantRerun rerun;
    private final Decisions decisions;
    private final TestNames names;
    private final PrintWriter out;
    private final Style style;

    FixCheck(MutantRerun rerun, Decisions decisions, TestNames names, PrintWriter out, Style style) {
        this.rerun = rerun;
        this.decisions = decisions;
        this.names = names;
        this.out = out;
        this.style = style;
    }

    /** Whether the mutant was detected on the re-run and is now recorded as fixed. */
    boolean check(MutantResult mutant) {
        out.println("running " + mutant.shortId() + " again against the code and tests as they are now …");
        out.flush();
        MutantResult now;
        try {
            now = rerun.rerun(mutant, step -> {
                out.println(style.dim("  " + step + " …"));
                out.flush();
            });
        } catch (UserError e) {
            out.println(style.yellow("cannot run it again: " + e.getMessage() + "; nothing recorded"));
            return false;
        }
        Verdict verdict = now.verdict();
        if (verdict.detected()) {
            String how = verdict == Verdict.KILLED && now.killedBy() != null ? "killed by " + names.of(now.killedBy()) : verdict.word();
            decisions.fixed(mutant, how);
            out.println(style.green(mutant.shortId() + " is " + how + " now: marked fixed"));
            return true;
        }
        if (verdict == Verdict.SURVIVED) {
            int ran = now.testsRun() == null ? 0 : now.testsRun().size();
            out.println(style.yellow(mutant.shortId() + " still survives (" + (ran == 1 ? "1 test ran" : ran + " tests ran")
                    + " and passed): not marked fixed. Add the assertion and try f again, or mark it t"));
            return false;
        }
        out.println(style.yellow(mutant.shortId() + " came out " + verdict.word()
                + (now.detail() == null ? "" : " (" + now.detail() + ")") + ": not marked fixed"));
        return false;
    }
}
