package dev.changeling.mutant;

import dev.changeling.source.Span;

/**
 * One syntactic change at one place in one file: the unit a first-order mutant has one of and a
 * k-order mutant has k of.
 *
 * @param file        project-relative path
 * @param type        the enclosing named type, dotted for nested types
 * @param member      the enclosing member's signature ({@code total(int,String)}, {@code <init>(int)}, a field name)
 * @param operator    the id of the operator that made it
 * @param kind        how the host is switched
 * @param host        the span of the expression or statement the change lives in
 * @param edit        the span of the text replaced, inside {@code host}
 * @param replacement the text put in place of {@code edit}
 * @param snippet     the host's original text, whitespace-normalised
 * @param description a short sentence naming the change
 * @param line        the 1-based line where the edit starts
 * @param oncePerJvm  whether the code runs once per JVM (static initialisers), so run-time switching cannot reach it
 * @param fingerprint the stable identity (see {@link Fingerprint})
 */
public record Point(
        String file,
        String type,
        String member,
        String operator,
        HostKind kind,
        Span host,
        Span edit,
        String replacement,
        String snippet,
        String description,
        int line,
        boolean oncePerJvm,
        String fingerprint) {

    /** The host's text after the change, given the file's original text. */
    public String mutatedHost(String fileText) {
        return fileText.substring(host.begin(), edit.begin())
                + replacement
                + fileText.substring(edit.end(), host.end());
    }
}
