package dev.changeling.results;

/**
 * One change of a mutant as stored in the results file. Positions are JavaParser's: 1-based, the
 * end column inclusive, counted in UTF-16 code units.
 */
public record PointRecord(
        String fingerprint,
        String operator,
        String type,
        String member,
        int line,
        int column,
        int endLine,
        int endColumn,
        String original,
        String replacement,
        String snippet,
        String description) {
}
