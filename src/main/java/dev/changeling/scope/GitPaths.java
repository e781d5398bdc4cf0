package dev.changeling.scope;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;

/** Undoes git's quoting of unusual path names ({@code "b/caf\303\251.java"}) so paths match the files on disk. */
final class GitPaths {

    private GitPaths() {
    }

    /**
     * The path as a diff header names it. The diff reader strips the {@code b/} prefix only from
     * unquoted names, so a quoted name loses it here when the header carries one.
     */
    static String fromDiff(String name, boolean prefixed) {
        if (!name.startsWith("\"")) {
            return name;
        }
        String unquoted = unquote(name);
        return prefixed && (unquoted.startsWith("b/") || unquoted.startsWith("a/")) ? unquoted.substring(2) : unquoted;
    }

    /** C-style unquoting as git writes it: octal bytes of UTF-8 and the usual backslash escapes. */
    static String unquote(String quoted) {
        if (quoted.length() < 2 || !quoted.startsWith("\"") || !quoted.endsWith("\"")) {
            return quoted;
        }
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        String body = quoted.substring(1, quoted.length() - 1);
        for (int i = 0; i < body.length(); i++) {
            char c = body.charAt(i);
            if (c != '\\' || i + 1 == body.length()) {
                bytes.writeBytes(String.valueOf(c).getBytes(StandardCharsets.UTF_8));
                continue;
            }
            char next = body.charAt(++i);
            if (next >= '0' && next <= '7' && i + 2 < body.length()) {
                bytes.write(Integer.parseInt(body.substring(i, i + 3), 8));
                i += 2;
                continue;
            }
            bytes.write(switch (next) {
                case 'n' -> '\n';
                case 't' -> '\t';
                case 'r' -> '\r';
                case 'a' -> 7;
                case 'b' -> '\b';
                case 'f' -> '\f';
                case 'v' -> 11;
                default -> next;
            });
        }
        return bytes.toString(StandardCharsets.UTF_8);
    }
}
