package dev.changeling.source;

import com.github.javaparser.Range;
import com.github.javaparser.ast.Node;

/**
 * One Java file as read from disk: its project-relative path (always with {@code /}) and its exact text.
 */
public record SourceFile(String path, String text, LineMap lines) {

    public static SourceFile of(String path, String text) {
        return new SourceFile(path.replace('\\', '/'), text, new LineMap(text));
    }

    /** The span a node covers; JavaParser ranges are 1-based and end-inclusive. */
    public Span spanOf(Node node) {
        Range range = node.getRange().orElseThrow(() -> new IllegalStateException("node without a range: " + node));
        return spanOf(range);
    }

    public Span spanOf(Range range) {
        int begin = lines.offset(range.begin.line, range.begin.column);
        int end = lines.offset(range.end.line, range.end.column) + 1;
        return new Span(begin, end);
    }

    public String textOf(Span span) {
        return text.substring(span.begin(), span.end());
    }

    public String textOf(Node node) {
        return textOf(spanOf(node));
    }

    public int lineOf(Span span) {
        return lines.line(span.begin());
    }
}
