/**
 * What the operators share about Java syntax and javac's rules: precedence and tokens, blank values
 * by type, constant expressions, definite assignment, loop conditions, catch clauses, and the
 * rewrites of binary and unary operators. No operator lives here.
 */
package dev.changeling.operator.syntax;
