package dev.changeling.mutant;

/** What a mutation point switches at run time, which decides how a schema wraps it. */
public enum HostKind {
    /** An expression: the schema chooses between the original and the mutated expression. */
    EXPRESSION,
    /** An expression in statement position ({@code i++;}, a for-loop update): it has a value but stands alone. */
    STATEMENT_EXPRESSION,
    /** A whole statement that the mutant removes. */
    STATEMENT
}
