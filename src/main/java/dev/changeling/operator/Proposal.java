package dev.changeling.operator;

import com.github.javaparser.ast.Node;
import dev.changeling.source.Span;

/** A change an operator proposes: in {@code host}, replace {@code edit} by {@code replacement}. */
public record Proposal(String operator, Node host, Span edit, String replacement, String description) {
}
