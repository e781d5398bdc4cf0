package dev.changeling.review;

import dev.changeling.results.MutantResult;
import dev.changeling.results.PointRecord;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.SortedMap;
import java.util.TreeMap;
import java.util.stream.Collectors;

/**
 * Where in one file the mutants are, line by line, for a strip of the file: each line with a mutant carries the
 * mark of its most pressing one (a survivor to look at over an unreached mutant over a detected one).
 *
 * @param file     the project-relative path
 * @param lastLine the last line any mutant of the file touches: the strip runs from line 1 to it
 * @param marks    the mark of each line with a mutant, by line number
 */
public record LineMarks(String file, int lastLine, SortedMap<Integer, Mark> marks) {

    /** What a line holds, least pressing first. */
    public enum Mark {
        DETECTED("detected"), UNREACHED("unreached"), SURVIVED("survived");

        private final String words;

        Mark(String words) {
            this.words = words;
        }

        public String words() {
            return words;
        }
    }

    public LineMarks {
        marks = Collections.unmodifiableSortedMap(new TreeMap<>(marks));
    }

    /** One strip per file of the run, in path order. Survived means unresolved: settled survivors mark nothing. */
    public static List<LineMarks> of(Standing standing) {
        Set<String> toLookAt = standing.toLookAt().stream().map(MutantResult::id).collect(Collectors.toSet());
        Map<String, List<MutantResult>> byFile = standing.results().mutants().stream()
                .collect(Collectors.groupingBy(MutantResult::file, TreeMap::new, Collectors.toList()));
        return byFile.entrySet().stream().map(entry -> ofFile(entry.getKey(), entry.getValue(), toLookAt)).toList();
    }

    private static LineMarks ofFile(String file, List<MutantResult> mutants, Set<String> toLookAt) {
        SortedMap<Integer, Mark> marks = new TreeMap<>();
        int lastLine = 1;
        for (MutantResult mutant : mutants) {
            Mark mark = markOf(mutant, toLookAt);
            for (PointRecord point : mutant.points()) {
                lastLine = Math.max(lastLine, Math.max(point.line(), point.endLine()));
                if (mark != null) {
                    marks.merge(point.line(), mark, (old, now) -> old.compareTo(now) >= 0 ? old : now);
                }
            }
        }
        return new LineMarks(file, lastLine, marks);
    }

    private static Mark markOf(MutantResult mutant, Set<String> toLookAt) {
        if (toLookAt.contains(mutant.id())) {
            return Mark.SURVIVED;
        }
        return switch (mutant.verdict()) {
            case UNREACHED -> Mark.UNREACHED;
            case KILLED, TIMED_OUT, CRASHED -> Mark.DETECTED;
            default -> null;
        };
    }

    /** The lines that carry {@code mark}, in order. */
    public List<Integer> linesWith(Mark mark) {
        return marks.entrySet().stream().filter(entry -> entry.getValue() == mark).map(Map.Entry::getKey).toList();
    }

    /** The most pressing mark among lines {@code from} to {@code to} inclusive, or null when none has a mutant. */
    public Mark worstBetween(int from, int to) {
        return marks.subMap(from, to + 1).values().stream().max(Enum::compareTo).orElse(null);
    }

    /** "survivors at 12, 40 · unreached at 77", or "nothing left to look at". */
    public String inWords() {
        List<Integer> survived = linesWith(Mark.SURVIVED);
        List<Integer> unreached = linesWith(Mark.UNREACHED);
        if (survived.isEmpty() && unreached.isEmpty()) {
            return "nothing left to look at";
        }
        StringBuilder words = new StringBuilder();
        if (!survived.isEmpty()) {
            words.append(survived.size() == 1 ? "survivor at " : "survivors at ").append(joined(survived));
        }
        if (!unreached.isEmpty()) {
            words.append(words.isEmpty() ? "" : " · ").append("unreached at ").append(joined(unreached));
        }
        return words.toString();
    }

    private static String joined(List<Integer> lines) {
        return lines.stream().map(String::valueOf).collect(Collectors.joining(", "));
    }
}
