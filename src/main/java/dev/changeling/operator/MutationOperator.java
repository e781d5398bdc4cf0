package dev.changeling.operator;

import com.github.javaparser.ast.Node;

/**
 * One mutation operator: looks at one syntax node and proposes the changes it makes there. Its
 * summary, what it models and its worked examples live in {@code operators/<id>.md}.
 */
public interface MutationOperator {

    /** The catalogue id, kebab-case. */
    String id();

    /** Proposes this operator's changes at {@code node}, if any; places that must not be mutated never reach here. */
    void visit(Node node, Proposals out);
}
