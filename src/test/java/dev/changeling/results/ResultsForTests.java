package dev.changeling.results;

import dev.changeling.mutant.Generation;
import dev.changeling.mutant.HigherOrder;
import dev.changeling.mutant.Mutant;
import dev.changeling.mutant.MutantRequest;
import dev.changeling.mutant.MutantDiff;
import dev.changeling.mutant.Point;
import dev.changeling.operator.Operators;
import dev.changeling.source.LineMap;
import dev.changeling.source.SourceFile;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/** Builds results the way a run stores them, for tests of the views that read them. */
public final class ResultsForTests {

    private ResultsForTests() {
    }

    /** A first-order result with a made-up point and diff. */
    public static MutantResult result(String id, String file, String operator, int order, Verdict verdict) {
        List<PointRecord> points = new ArrayList<>();
        for (int i = 0; i < order; i++) {
            points.add(new PointRecord(id + i, operator, "shop.Till", "total(int)", 10 + i, 13, 10 + i, 13,
                    "<", "<=", "a < b", "replaced < with <="));
        }
        String diff = "--- a/" + file + "\n+++ b/" + file + "\n@@ -10 +10 @@\n-        if (a < b) {\n+        if (a <= b) {\n";
        return new MutantResult(id, file, order, points, verdict, verdict == Verdict.KILLED ? "[engine:junit-jupiter]/x" : null,
                null, List.of(), List.of("[engine:junit-jupiter]/x"), 1.0, diff);
    }

    /** A result for a real mutant of a real file, positions as JavaParser gives them and the diff as a run stores it. */
    public static MutantResult of(Mutant mutant, SourceFile file, Verdict verdict) {
        LineMap lines = file.lines();
        List<PointRecord> points = new ArrayList<>();
        for (Point point : mutant.points()) {
            int begin = point.edit().begin();
            int last = Math.max(begin, point.edit().end() - 1);
            points.add(new PointRecord(point.fingerprint(), point.operator(), point.type(), point.member(),
                    lines.line(begin), lines.column(begin), lines.line(last), point.edit().end() == begin
                            ? lines.column(begin) - 1 : lines.column(last),
                    file.textOf(point.edit()), point.replacement(), point.snippet(), point.description()));
        }
        return new MutantResult(mutant.fingerprint(), mutant.file(), mutant.order(), points, verdict, null, null,
                List.of(), List.of(), 0.0, MutantDiff.unified(mutant, file.text()));
    }

    /** Every mutant the real generator makes of these files at these orders (relational-subset), all as survivors. */
    public static List<MutantResult> survivorsOf(List<SourceFile> files, List<Integer> orders) {
        return survivorsOf(files, orders, List.of("relational-subset"));
    }

    /** Every mutant the real generator makes of these files at these orders with these operators, all as survivors. */
    public static List<MutantResult> survivorsOf(List<SourceFile> files, List<Integer> orders, List<String> operators) {
        MutantRequest request = new MutantRequest(Operators.named(operators), orders, HigherOrder.Scope.METHOD, 7L, point -> true);
        Generation.Generated generated = Generation.generate(files, request);
        if (!generated.problems().isEmpty()) {
            throw new IllegalArgumentException("sample does not parse: " + generated.problems());
        }
        return generated.mutants().stream()
                .map(mutant -> of(mutant, generated.files().get(mutant.file()), Verdict.SURVIVED))
                .toList();
    }

    /** A complete run over these results. */
    public static RunResults run(List<MutantResult> mutants, boolean sampled, int population) {
        RunSettings settings = new RunSettings("/tmp/shop", List.of("relational-subset"), List.of(1), "method", 1L,
                sampled, population, null, 1, 2.0, 1000L, List.of(), List.of(), List.of(), "2g", null, null, 500, false, 0,
                false, null);
        return new RunResults(RunResults.FORMAT, true, settings, List.of(), Map.of(), mutants, List.of(), Map.of());
    }
}
