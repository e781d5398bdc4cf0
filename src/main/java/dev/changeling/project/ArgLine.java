package dev.changeling.project;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Consumer;

/**
 * The test JVM's options from Surefire's {@code argLine}: property references filled in, split into
 * arguments as a shell would (quotes group), and the heap size taken apart from the rest.
 *
 * @param arguments the options, without {@code -Xmx}
 * @param maxHeap   the {@code -Xmx} value, when the line sets one
 */
record ArgLine(List<String> arguments, Optional<String> maxHeap) {

    static ArgLine none() {
        return new ArgLine(List.of(), Optional.empty());
    }

    /**
     * Reads a line. A reference to a property the POM does not define belongs to a plugin that sets it while
     * Maven runs (a coverage agent, typically); the argument holding it is dropped and {@code notice} told.
     */
    static ArgLine parse(String line, Map<String, String> properties, Consumer<String> notice) {
        List<String> arguments = new ArrayList<>();
        Optional<String> maxHeap = Optional.empty();
        for (String word : words(line.replace('\n', ' ').replace('\r', ' '))) {
            String filled = PropertyReferences.filled(word, properties);
            if (PropertyReferences.hasAny(filled)) {
                notice.accept("argLine: left out " + word + " (a property set by a plugin while Maven runs, not known before)");
                continue;
            }
            // A property's value may hold several options; a word as written was split already.
            for (String argument : filled.equals(word) ? List.of(word) : words(filled)) {
                if (argument.startsWith("-Xmx")) {
                    maxHeap = Optional.of(argument.substring("-Xmx".length()));
                } else {
                    arguments.add(argument);
                }
            }
        }
        return new ArgLine(List.copyOf(arguments), maxHeap);
    }

    /** Splits at unquoted white space; single or double quotes group and are removed. */
    static List<String> words(String line) {
        List<String> words = new ArrayList<>();
        StringBuilder word = new StringBuilder();
        boolean inWord = false;
        char quote = 0;
        for (char c : line.toCharArray()) {
            if (quote != 0) {
                if (c == quote) {
                    quote = 0;
                } else {
                    word.append(c);
                }
            } else if (c == '"' || c == '\'') {
                quote = c;
                inWord = true;
            } else if (Character.isWhitespace(c)) {
                if (inWord) {
                    words.add(word.toString());
                    word.setLength(0);
                    inWord = false;
                }
            } else {
                word.append(c);
                inWord = true;
            }
        }
        if (inWord) {
            words.add(word.toString());
        }
        return words;
    }
}
