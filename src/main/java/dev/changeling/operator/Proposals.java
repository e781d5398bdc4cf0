package dev.changeling.operator;

import dev.changeling.operator.syntax.LoopConditions;
import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.stmt.Statement;
import dev.changeling.source.SourceFile;
import dev.changeling.source.Span;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Predicate;

/** Collects the changes operators propose in one file, and gives them the file's spans and text. */
public final class Proposals {

    private final SourceFile file;
    private final Predicate<Span> untouchable;
    private final List<Proposal> collected = new ArrayList<>();
    private String operator = "";

    public Proposals(SourceFile file) {
        this(file, span -> false);
    }

    /** Proposals whose host lies on a span {@code untouchable} names are dropped. */
    public Proposals(SourceFile file, Predicate<Span> untouchable) {
        this.file = file;
        this.untouchable = untouchable;
    }

    /** Sets the operator that the following proposals belong to. */
    public void from(MutationOperator current) {
        this.operator = current.id();
    }

    public SourceFile file() {
        return file;
    }

    public Span span(Node node) {
        return file.spanOf(node);
    }

    public String text(Node node) {
        return file.textOf(node);
    }

    /**
     * Replaces part of {@code host} (the span {@code edit}) by {@code replacement}. A change that would
     * leave a loop condition constant is dropped here, for every operator (see {@link LoopConditions}), and so
     * is one whose host is untouchable.
     */
    public void replace(Node host, Span edit, String replacement, String description) {
        Span hostSpan = span(host);
        if (!hostSpan.contains(edit)) {
            throw new IllegalArgumentException("edit " + edit + " lies outside its host " + hostSpan);
        }
        if (untouchable.test(hostSpan)) {
            return;
        }
        if (LoopConditions.wouldBeConstant(file, host, edit, replacement)) {
            return;
        }
        collected.add(new Proposal(operator, host, edit, replacement, description));
    }

    /** Replaces the whole of {@code host} by {@code replacement}. */
    public void replaceWhole(Node host, String replacement, String description) {
        replace(host, span(host), replacement, description);
    }

    /** Removes a statement. */
    public void delete(Statement statement, String description) {
        replaceWhole(statement, "", description);
    }

    public List<Proposal> collected() {
        return List.copyOf(collected);
    }
}
