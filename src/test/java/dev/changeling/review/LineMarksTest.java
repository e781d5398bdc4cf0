package dev.changeling.review;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.changeling.analysis.Score;
import dev.changeling.results.MutantResult;
import dev.changeling.results.PointRecord;
import dev.changeling.results.ResultsForTests;
import dev.changeling.results.RunResults;
import dev.changeling.results.Verdict;
import dev.changeling.review.LineMarks.Mark;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;

class LineMarksTest {

    private static MutantResult at(String id, String file, int line, Verdict verdict) {
        MutantResult made = ResultsForTests.result(id, file, "relational-subset", 1, verdict);
        PointRecord point = made.first();
        PointRecord moved = new PointRecord(point.fingerprint(), point.operator(), point.type(), point.member(), line,
                point.column(), line, point.endColumn(), point.original(), point.replacement(), point.snippet(), point.description());
        return new MutantResult(made.id(), file, 1, List.of(moved), verdict, made.killedBy(), null, List.of(),
                made.reachedBy(), 1.0, made.diff());
    }

    private static List<LineMarks> marks(Set<String> resolved, MutantResult... mutants) {
        RunResults results = ResultsForTests.run(List.of(mutants), false, mutants.length);
        Standing standing = new Standing(results, Score.of(results.mutants(), Set.of()),
                Survivors.unresolved(results.mutants(), mutant -> resolved.contains(mutant.id())), List.of());
        return LineMarks.of(standing);
    }

    @Test
    void eachLine_carriesItsMostPressingMark_andTheStripEndsAtTheLastMutatedLine() {
        List<LineMarks> files = marks(Set.of(),
                at("k1", "A.java", 12, Verdict.KILLED),
                at("s1", "A.java", 12, Verdict.SURVIVED),
                at("u1", "A.java", 30, Verdict.UNREACHED),
                at("k2", "A.java", 41, Verdict.KILLED),
                at("b1", "A.java", 50, Verdict.STILLBORN));

        assertEquals(1, files.size());
        LineMarks file = files.get(0);
        assertEquals(50, file.lastLine());
        assertEquals(Map.of(12, Mark.SURVIVED, 30, Mark.UNREACHED, 41, Mark.DETECTED), file.marks());
        assertEquals("survivor at 12 · unreached at 30", file.inWords());
        assertEquals(Mark.UNREACHED, file.worstBetween(13, 40));
        assertEquals(null, file.worstBetween(42, 50));
    }

    @Test
    void aSettledSurvivor_marksNothing_andFilesComeInPathOrder() {
        List<LineMarks> files = marks(Set.of("s1"),
                at("s1", "B.java", 5, Verdict.SURVIVED),
                at("k1", "A.java", 3, Verdict.KILLED));

        assertEquals(List.of("A.java", "B.java"), files.stream().map(LineMarks::file).toList());
        assertEquals(Map.of(), files.get(1).marks());
        assertEquals("nothing left to look at", files.get(1).inWords());
    }
}
