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

    public static Generated generate(List<SourceFile> sources, MutantRequest request) {
        PointFinder finder = new PointFinder(request.operators(), request.mutateDiagnostics(), request.pointFilter());
        List<Point> points = new ArrayList<>();
        Map<String, SourceFile> files = new LinkedHashMap<>();
        List<ParseProblem> problems = new ArrayList<>();
        Map<String, Integer> notMade = new TreeMap<>();
        Map<String, List<EntryMethods.EntryMethod>> entryMethods = new LinkedHashMap<>();
        long lines = 0;
        for (SourceFile source : sources) {
            lines += source.lines().lineCount();
            JavaSources.Parsed parsed = JavaSources.parse(source);
            if (!parsed.ok()) {
                problems.add(parsed.problem());
                continue;
            }
            files.put(source.path(), source);
            entryMethods.put(source.path(), EntryMethods.of(parsed));
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
        finder.notMade().forEach((reason, count) -> notMade.merge(reason, count, Integer::sum));
        return new Generated(mutants, files, problems, lines, notMade, entryMethods);
    }
}
