package dev.changeling.results;

import dev.changeling.mutant.Mutant;
import dev.changeling.mutant.MutantDiff;
import dev.changeling.mutant.Point;
import dev.changeling.source.LineMap;
import dev.changeling.source.SourceFile;
import java.util.List;

/** Turns mutants into the records of the results file. */
public final class Records {

    private Records() {
    }

    /** A mutant with no verdict yet beyond the one given, carrying its diff and positions. */
    public static MutantResult of(Mutant mutant, SourceFile file, Verdict verdict, String detail) {
        List<PointRecord> points = mutant.points().stream().map(point -> of(point, file)).toList();
        return new MutantResult(mutant.fingerprint(), mutant.file(), mutant.order(), points, verdict, null, detail,
                List.of(), List.of(), 0, MutantDiff.unified(mutant, file.text()));
    }

    static PointRecord of(Point point, SourceFile file) {
        LineMap lines = file.lines();
        int begin = point.edit().begin();
        int last = Math.max(begin, point.edit().end() - 1);
        return new PointRecord(point.fingerprint(), point.operator(), point.type(), point.member(),
                lines.line(begin), lines.column(begin), lines.line(last), lines.column(last),
                file.textOf(point.edit()), point.replacement(), point.snippet(), point.description());
    }
}
