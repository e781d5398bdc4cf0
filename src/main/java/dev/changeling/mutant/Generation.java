package dev.changeling.mutant;

import dev.changeling.source.JavaSources;
import dev.changeling.source.ParseProblem;
import dev.changeling.source.SourceFile;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

/** Parses files and makes the mutants a request asks for; files that do not parse are reported and skipped. */
public final class Generation {

    /**
     * The mutants of a set of files, the files they were made from, and the files that were skipped.
     *
     * @param notMade      points in scope not made, by reason: code that only serves diagnostics, a suppression rule,
     *                     or a line's budget
     * @param entryMethods each parsed file's methods whose entry a schema notes ({@link EntryMethods}), found while
     *                     the file's tree was at hand
     */
    public record Generated(List<Mutant> mutants, Map<String, SourceFile> files, List<ParseProblem> problems,
                            long lines, Map<String, Integer> notMade, Map<String, List<EntryMethods.EntryMethod>> entryMethods) {
    }

    private Generation() {
    }

    /**
     * The mutants of the files. Files are parsed and their points found on every core, each file on its own; the
     * outcomes are joined in the order the files are given, so the result is the same as one file after another.
     */
    public static Generated generate(List<SourceFile> sources, MutantRequest request) {
        List<FileOutcome> outcomes = sources.parallelStream().map(source -> FileOutcome.of(source, request)).toList();
        List<Point> points = new ArrayList<>();
        Map<String, SourceFile> files = new LinkedHashMap<>();
        List<ParseProblem> problems = new ArrayList<>();
        Map<String, Integer> notMade = new TreeMap<>();
        Map<String, List<EntryMethods.EntryMethod>> entryMethods = new LinkedHashMap<>();
        long lines = 0;
        for (FileOutcome outcome : outcomes) {
            lines += outcome.source().lines().lineCount();
            if (outcome.problem() != null) {
                problems.add(outcome.problem());
                continue;
            }
            files.put(outcome.source().path(), outcome.source());
            entryMethods.put(outcome.source().path(), outcome.entryMethods());
            points.addAll(outcome.points());
            outcome.notMade().forEach((reason, count) -> notMade.merge(reason, count, Integer::sum));
        }
        points = request.budget().keep(points, notMade);
        List<Mutant> mutants = new ArrayList<>();
        for (int order : request.orders()) {
            if (order == 1) {
                points.stream().map(Mutant::firstOrder).forEach(mutants::add);
            } else {
                mutants.addAll(HigherOrder.combine(points, order, request.scope(), request.seed()));
            }
        }
        return new Generated(mutants, files, problems, lines, notMade, entryMethods);
    }

    /**
     * What one file gave: a problem when it does not parse; else its points in scope and not suppressed, the points
     * not made by reason, and its methods whose entry a schema notes.
     */
    private record FileOutcome(SourceFile source, ParseProblem problem, List<Point> points, Map<String, Integer> notMade,
                               List<EntryMethods.EntryMethod> entryMethods) {

        static FileOutcome of(SourceFile source, MutantRequest request) {
            JavaSources.Parsed parsed = JavaSources.parse(source);
            if (!parsed.ok()) {
                return new FileOutcome(source, parsed.problem(), List.of(), Map.of(), List.of());
            }
            PointFinder finder = new PointFinder(request.operators(), request.mutateDiagnostics(), request.pointFilter());
            List<Point> points = new ArrayList<>();
            Map<String, Integer> notMade = new TreeMap<>();
            for (Point point : finder.find(parsed)) {
                if (!request.pointFilter().test(point)) {
                    continue;
                }
                Optional<String> suppressed = request.suppressions().reason(point);
                if (suppressed.isPresent()) {
                    notMade.merge(suppressed.get(), 1, Integer::sum);
                } else {
                    points.add(point);
                }
            }
            finder.notMade().forEach((reason, count) -> notMade.merge(reason, count, Integer::sum));
            return new FileOutcome(source, null, points, notMade, EntryMethods.of(parsed));
        }
    }
}
