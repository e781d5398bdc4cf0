package dev.changeling.review.triage;

import dev.changeling.review.TestNames;
import dev.changeling.Text;
import dev.changeling.UserError;
import dev.changeling.results.MutantResult;
import dev.changeling.results.Verdict;
import dev.changeling.review.EquivalentsList;
import dev.changeling.review.IdPrefix;
import dev.changeling.review.SameClasses;
import dev.changeling.review.TriageMarks;
import dev.changeling.review.Survivors;
import dev.changeling.terminal.Style;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/** One run of the triage loop: show a survivor, read an answer, act on it, until done. */
final class Session {

    /** After an answer: stay at the prompt, show the (current, perhaps other) survivor, or stop. */
    private enum Step { STAY, SHOW, QUIT }

    private final Triage.Setup setup;
    private final Answers answers;
    private final PrintWriter out;
    private final Style style;
    private final Decisions decisions;
    private final CurrentSources sources;
    private final TestNames names;
    private final SurvivorView view;
    private final FixCheck fixCheck;
    private final SourceEditor editor;
    private final SameClasses sameClasses;
    private final RuleOffer ruleOffer;
    private final Set<String> skipped = new HashSet<>();
    private Walk walk;
    private int contextLines;

    Session(Triage.Setup setup, Answers answers, PrintWriter out, MutantRerun rerun) {
        this.setup = setup;
        this.answers = answers;
        this.out = out;
        this.style = setup.style();
        this.sameClasses = SameClasses.of(setup.results());
        this.decisions = Decisions.load(setup.projectRoot(), sameClasses::duplicatesOf);
        this.sources = new CurrentSources(setup.projectRoot(), setup.results().sourceHashes());
        this.names = new TestNames(setup.results().tests());
        this.view = new SurvivorView(out, style, names, sameClasses);
        this.fixCheck = new FixCheck(rerun, decisions, names, out, style);
        this.editor = new SourceEditor(setup.environment(), setup.projectRoot(), out, style);
        this.ruleOffer = new RuleOffer(setup.projectRoot(), answers, out, style);
    }

    Triage.Ending run() {
        List<MutantResult> mutants = setup.results().mutants() == null ? List.of() : setup.results().mutants();
        List<MutantResult> survivors = Survivors.unresolved(mutants, decisions::resolved).stream()
                .filter(survivor -> !sameClasses.isDuplicate(survivor)).toList();
        walk = Walk.start(survivors, decisions::decided, setup.revisit());
        if (!setup.results().complete()) {
            out.println(style.yellow("the last run was interrupted: only the mutants it finished are here"));
        }
        if (survivors.isEmpty()) {
            out.println(mutants.stream().anyMatch(mutant -> mutant.verdict() == Verdict.SURVIVED)
                    ? "nothing to triage: every survivor of the last run is listed as equivalent or marked fixed"
                    : "nothing to triage: no mutant survived the last run");
            return ending();
        }
        if (walk.finished()) {
            out.println((survivors.size() == 1 ? "the one unresolved survivor has"
                    : "every one of the " + survivors.size() + " unresolved survivors has")
                    + " a decision already; give --revisit to go through them again");
            return ending();
        }
        out.println(survivors.size() + (survivors.size() == 1 ? " survivor" : " survivors") + " to triage, starting at "
                + walk.position() + (walk.position() == 1 ? "" : ", the first without a decision")
                + ". Answer with a letter and Enter; ? explains each.");
        loop();
        farewell();
        return ending();
    }

    private void loop() {
        boolean fresh = true;
        while (!walk.finished()) {
            MutantResult mutant = walk.current();
            if (fresh) {
                show(mutant);
            }
            String line = answers.ask(prompt());
            if (line == null) {
                out.println("end of input: stopping here");
                return;
            }
            Step step = answer(mutant, line);
            if (step == Step.QUIT) {
                return;
            }
            fresh = step == Step.SHOW;
        }
        out.println("that was the last survivor");
    }

    private void show(MutantResult mutant) {
        contextLines = 0;
        view.show(mutant, walk.position(), walk.size(), sources.of(mutant.file()).state(), decisions.of(mutant));
        decisions.lapse(mutant).ifPresent(lapse -> out.println(style.yellow(lapse)));
        out.println(style.dim(counts().line()));
    }

    private static String prompt() {
        return Choice.menu() + " > ";
    }

    private Step answer(MutantResult mutant, String line) {
        var answer = Choice.parse(line);
        if (answer.isEmpty()) {
            if (!line.isBlank()) {
                out.println("'" + line.strip() + "' is not one of the choices; ? explains them");
            }
            return Step.STAY;
        }
        String text = answer.get().text();
        try {
            return switch (answer.get().choice()) {
                case EQUIVALENT -> equivalent(mutant, text);
                case NEEDS_TEST -> needsTest(mutant, text);
                case FIXED -> fixed(mutant);
                case UNDO -> undo(mutant);
                case SKIP -> skip(mutant);
                case BACK -> back();
                case GO_TO -> goTo(text);
                case LIST -> list();
                case CONTEXT -> context(mutant);
                case OPEN -> open(mutant);
                case QUIT -> Step.QUIT;
                case HELP -> help();
            };
        } catch (UserError e) {
            out.println(style.red("not saved: " + e.getMessage()));
            return Step.STAY;
        }
    }

    private Step equivalent(MutantResult mutant, String given) {
        String reason = !given.isEmpty() ? given : sameClasses.proposedReason(mutant)
                .orElseGet(() -> answers.ask("why can no test tell it from the original? (one line, required) > "));
        if (reason == null) {
            out.println("end of input: not marked");
            return Step.QUIT;
        }
        if (reason.isBlank()) {
            out.println("not marked: an equivalent needs a reason, so that reviewers of the list can check it");
            return Step.STAY;
        }
        decisions.equivalent(mutant, reason.strip());
        out.println(style.green("listed " + mutant.shortId() + " as equivalent in " + shown(EquivalentsList.in(setup.projectRoot()))));
        return ruleOffer.afterEquivalent(mutant) ? forward() : Step.QUIT;
    }

    private Step needsTest(MutantResult mutant, String note) {
        decisions.needsTest(mutant, note);
        out.println(style.green("marked " + mutant.shortId() + " as needing a test in " + shown(TriageMarks.in(setup.projectRoot()))));
        return forward();
    }

    private Step fixed(MutantResult mutant) {
        return fixCheck.check(mutant) ? forward() : Step.STAY;
    }

    private Step undo(MutantResult mutant) {
        var cleared = decisions.clear(mutant);
        if (cleared.isEmpty()) {
            out.println(mutant.shortId() + " has no decision to clear");
            return Step.STAY;
        }
        Path file = cleared.get().kind() == Decision.Kind.EQUIVALENT
                ? EquivalentsList.in(setup.projectRoot()) : TriageMarks.in(setup.projectRoot());
        out.println(style.green("cleared " + mutant.shortId() + ": no longer " + cleared.get().shown() + " in " + shown(file)));
        out.println(style.dim(counts().line()));
        return Step.STAY;
    }

    private Step skip(MutantResult mutant) {
        if (!decisions.decided(mutant)) {
            skipped.add(mutant.id());
        }
        if (walk.hasNext()) {
            return forward();
        }
        if (walk.wrap()) {
            out.println(setup.revisit() ? "that was the last survivor; round again from the first"
                    : "that was the last survivor; round again from the first still without a decision");
            return Step.SHOW;
        }
        out.println("no other survivor is without a decision: decide this one, go back with b, or quit with q");
        return Step.STAY;
    }

    private Step back() {
        if (walk.back()) {
            return Step.SHOW;
        }
        out.println("this is the first survivor");
        return Step.STAY;
    }

    private Step goTo(String id) {
        if (id.isEmpty()) {
            out.println("g needs the start of a survivor's id, such as g " + walk.current().shortId().substring(0, IdPrefix.MIN_LENGTH)
                    + "; l lists them");
            return Step.STAY;
        }
        MutantResult target;
        try {
            target = IdPrefix.single(id, walk.survivors(), MutantResult::id, "among the unresolved survivors here", "l lists them");
        } catch (UserError e) {
            out.println(e.getMessage());
            return Step.STAY;
        }
        walk.goTo(target);
        return Step.SHOW;
    }

    private Step list() {
        out.print(SurvivorList.render(walk.survivors(), walk.position() - 1, this::status, style));
        out.println("back at survivor " + walk.position() + " of " + walk.size() + " · " + walk.current().shortId());
        return Step.STAY;
    }

    private String status(MutantResult mutant) {
        return decisions.of(mutant).map(decision -> decision.kind().label())
                .orElse(skipped.contains(mutant.id()) ? "skipped" : "");
    }

    private Step context(MutantResult mutant) {
        contextLines += WiderContext.STEP;
        out.print(WiderContext.render(sources.of(mutant.file()), mutant, contextLines, style));
        return Step.STAY;
    }

    private Step open(MutantResult mutant) {
        CurrentSources.Current file = sources.of(mutant.file());
        if (file.state() == CurrentSources.State.GONE) {
            out.println(style.yellow(mutant.file() + " is gone since the run: there is nothing to open"));
            return Step.STAY;
        }
        int line = WiderContext.lineNow(file, mutant).orElse(mutant.first().line());
        return editor.open(setup.projectRoot().resolve(mutant.file()), mutant.file(), line) ? Step.SHOW : Step.STAY;
    }

    private Step help() {
        out.print(Choice.helpScreen(style));
        return Step.STAY;
    }

    private Step forward() {
        walk.forward();
        return Step.SHOW;
    }

    private void farewell() {
        out.println(counts().line());
        out.println(walk.resumesAt()
                .map(next -> "every decision is saved; the next triage starts at " + next.shortId() + " "
                        + next.file() + ":" + next.first().line())
                .orElse("every decision is saved; every survivor here has one"));
        out.flush();
    }

    private Counts counts() {
        return Counts.of(walk.survivors(), decisions, skipped);
    }

    private Triage.Ending ending() {
        Counts counts = counts();
        return new Triage.Ending(counts.survivors(), counts.decided(), walk.resumesAt().map(MutantResult::shortId));
    }

    private String shown(Path file) {
        return Text.relative(setup.projectRoot(), file);
    }
}
