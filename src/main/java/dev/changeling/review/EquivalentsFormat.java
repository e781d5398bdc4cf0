package dev.changeling.review;

import dev.changeling.UserError;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Reads and writes the equivalents list, one entry a line (docs/equivalents-format.md): fields
 * between {@code |}, backslash escapes so an entry never spans lines, comments only at the top.
 */
final class EquivalentsFormat {

    static final String SEPARATOR = " | ";
    static final String ARROW = "→";
    static final List<String> DEFAULT_HEADER = List.of(
            "# Changeling: mutants judged equivalent. One per line, sorted; matched by fingerprint only. When merging, keep both sides.",
            "# fingerprint | file | type#member | operator | original → mutated | reason     (escapes: \\| \\\\ \\n \\t \\uXXXX)");

    private static final int FIELDS = 6;
    private static final String FIELD_LIST = "fingerprint | file | type#member | operator | original → mutated | reason";
    private static final List<String> CONFLICT_MARKERS = List.of("<<<<<<<", "=======", ">>>>>>>", "|||||||");

    private EquivalentsFormat() {
    }

    /** The file as read: its comment header, kept as it is, and its entries in file order. */
    record Parsed(List<String> header, List<EquivalentEntry> entries) {
    }

    static Parsed parse(byte[] bytes, String fileName) {
        List<String> lines = decodeLines(bytes, fileName);
        List<String> header = new ArrayList<>();
        List<EquivalentEntry> entries = new ArrayList<>();
        Map<String, Integer> lineOf = new HashMap<>();
        boolean inHeader = true;
        for (int i = 0; i < lines.size(); i++) {
            String line = lines.get(i);
            String where = fileName + ":" + (i + 1) + ": ";
            for (String marker : CONFLICT_MARKERS) {
                if (line.startsWith(marker)) {
                    throw new UserError(where + "unresolved git merge conflict (a line starting with '" + marker
                            + "'); keep the entries of both sides, delete the marker lines, and run again");
                }
            }
            if (line.isBlank()) {
                continue;
            }
            if (line.startsWith("#")) {
                if (!inHeader) {
                    throw new UserError(where + "a comment below the entries; comments are kept only at the top of the "
                            + "file, so move it there or put the note in the entry's reason");
                }
                header.add(line.stripTrailing());
                continue;
            }
            inHeader = false;
            EquivalentEntry entry = entry(line, where);
            Integer earlier = lineOf.putIfAbsent(entry.fingerprint(), i + 1);
            if (earlier != null) {
                EquivalentEntry first = entries.stream().filter(e -> e.fingerprint().equals(entry.fingerprint())).findFirst().orElseThrow();
                if (!first.equals(entry)) {
                    throw new UserError(where + "mutant " + entry.shortId() + " is also listed on line " + earlier
                            + " with other text; keep one of the two lines");
                }
                continue;
            }
            entries.add(entry);
        }
        return new Parsed(header, entries);
    }

    static String render(List<String> header, Collection<EquivalentEntry> entries) {
        StringBuilder out = new StringBuilder();
        for (String line : header.isEmpty() ? DEFAULT_HEADER : header) {
            out.append(line).append('\n');
        }
        entries.stream().sorted(EquivalentEntry.ORDER).forEach(entry -> out.append(line(entry)).append('\n'));
        return out.toString();
    }

    static String line(EquivalentEntry entry) {
        return String.join(SEPARATOR,
                entry.fingerprint(),
                escape(entry.file(), false),
                escape(entry.type(), false) + "#" + escape(entry.member(), false),
                escape(entry.operator(), false),
                escape(entry.original(), true) + " " + ARROW + " " + escape(entry.mutated(), true),
                escape(entry.reason(), false));
    }

    private static EquivalentEntry entry(String line, String where) {
        List<String> fields = split(line);
        if (fields.size() != FIELDS) {
            throw new UserError(where + "expected " + FIELDS + " fields (" + FIELD_LIST + "), found " + fields.size()
                    + "; a '|' inside a field is written \\|");
        }
        String fingerprint = fields.get(0).strip();
        if (!EquivalentEntry.isFingerprint(fingerprint.toLowerCase(java.util.Locale.ROOT))) {
            throw new UserError(where + "'" + fingerprint + "' is not a full fingerprint (64 hexadecimal digits); "
                    + "copy it from the results, a short id cannot be matched");
        }
        String file = unescape(fields.get(1), 2, where);
        if (file.isBlank()) {
            throw new UserError(where + "the file field is empty; give the project-relative path of the mutated file");
        }
        String location = fields.get(2).strip();
        int hash = location.indexOf('#');
        if (hash < 0) {
            throw new UserError(where + "'" + location + "' should read type#member, e.g. Tides#clamp(int,int,int)");
        }
        String operator = unescape(fields.get(3), 4, where);
        if (operator.isBlank()) {
            throw new UserError(where + "the operator field is empty; give the id of the operator that made the mutant");
        }
        String change = fields.get(4);
        int arrow = change.indexOf(ARROW);
        if (arrow < 0 || arrow != change.lastIndexOf(ARROW)) {
            throw new UserError(where + "the change field should read 'original " + ARROW + " mutated' with one "
                    + ARROW + " (an arrow inside the code is written \\u2192)");
        }
        return new EquivalentEntry(fingerprint, file,
                unescape(location.substring(0, hash), 3, where), unescape(location.substring(hash + 1), 3, where),
                operator, unescape(change.substring(0, arrow), 5, where), unescape(change.substring(arrow + 1), 5, where),
                unescape(fields.get(5), 6, where));
    }

    /** Splits at each {@code |} that no backslash escapes; the escapes themselves stay for {@link #unescape}. */
    private static List<String> split(String line) {
        List<String> fields = new ArrayList<>();
        StringBuilder field = new StringBuilder();
        for (int i = 0; i < line.length(); i++) {
            char c = line.charAt(i);
            if (c == '\\' && i + 1 < line.length()) {
                field.append(c).append(line.charAt(++i));
            } else if (c == '|') {
                fields.add(field.toString());
                field.setLength(0);
            } else {
                field.append(c);
            }
        }
        fields.add(field.toString());
        return fields;
    }

    static String escape(String text, boolean arrow) {
        StringBuilder out = new StringBuilder(text.length());
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            switch (c) {
                case '\\' -> out.append("\\\\");
                case '|' -> out.append("\\|");
                case '\n' -> out.append("\\n");
                case '\r' -> out.append("\\r");
                case '\t' -> out.append("\\t");
                default -> {
                    if (Character.isISOControl(c) || c == 0x2028 || c == 0x2029 || (arrow && c == '→') || Character.isSurrogate(c) && !validPair(text, i)) {
                        out.append(String.format("\\u%04x", (int) c));
                    } else {
                        out.append(c);
                    }
                }
            }
        }
        return out.toString();
    }

    private static boolean validPair(String text, int i) {
        char c = text.charAt(i);
        if (Character.isHighSurrogate(c)) {
            return i + 1 < text.length() && Character.isLowSurrogate(text.charAt(i + 1));
        }
        return i > 0 && Character.isHighSurrogate(text.charAt(i - 1));
    }

    static String unescape(String field, int number, String where) {
        String text = field.strip();
        StringBuilder out = new StringBuilder(text.length());
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c != '\\') {
                out.append(c);
                continue;
            }
            char next = i + 1 < text.length() ? text.charAt(i + 1) : ' ';
            i++;
            switch (next) {
                case '\\' -> out.append('\\');
                case '|' -> out.append('|');
                case 'n' -> out.append('\n');
                case 'r' -> out.append('\r');
                case 't' -> out.append('\t');
                case 'u' -> {
                    String hex = i + 5 <= text.length() ? text.substring(i + 1, i + 5) : "";
                    if (!hex.matches("[0-9a-fA-F]{4}")) {
                        throw new UserError(where + "field " + number + " has '\\u' without four hex digits after it; "
                                + "write \\\\ for a backslash");
                    }
                    out.append((char) Integer.parseInt(hex, 16));
                    i += 4;
                }
                default -> throw new UserError(where + "field " + number + " has the unknown escape '\\" + next
                        + "'; write \\\\ for a backslash (known: \\| \\\\ \\n \\r \\t \\uXXXX)");
            }
        }
        return out.toString();
    }

    /** Lines of UTF-8 text; a line that is not UTF-8 is named. A file may end with or without a line break, in LF or CRLF. */
    private static List<String> decodeLines(byte[] bytes, String fileName) {
        List<String> lines = new ArrayList<>();
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        int start = 0;
        if (bytes.length >= 3 && (bytes[0] & 0xff) == 0xef && (bytes[1] & 0xff) == 0xbb && (bytes[2] & 0xff) == 0xbf) {
            start = 3;
        }
        for (int i = start; i <= bytes.length; i++) {
            if (i < bytes.length && bytes[i] != '\n') {
                continue;
            }
            int end = i > start && bytes[i - 1] == '\r' ? i - 1 : i;
            if (i < bytes.length || end > start) {
                try {
                    lines.add(decoder.decode(ByteBuffer.wrap(bytes, start, end - start)).toString());
                } catch (CharacterCodingException e) {
                    throw new UserError(fileName + ":" + (lines.size() + 1) + ": not UTF-8 text; save the file as UTF-8");
                }
            }
            start = i + 1;
        }
        return lines;
    }
}
