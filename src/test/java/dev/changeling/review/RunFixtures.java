package dev.changeling.review;

import dev.changeling.mutant.Generation;
import dev.changeling.mutant.Mutant;
import dev.changeling.mutant.MutantRequest;
import dev.changeling.mutant.Point;
import dev.changeling.operator.MutationOperator;
import dev.changeling.operator.Operators;
import dev.changeling.results.MutantResult;
import dev.changeling.results.PointRecord;
import dev.changeling.results.RunResults;
import dev.changeling.results.RunSettings;
import dev.changeling.results.Verdict;
import dev.changeling.source.SourceFile;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;

/** Mutants made by the real generator, and results files built from them, for tests of the review package. */
public final class RunFixtures {

    /** The operators the fixtures were written for; pinned so that new operators do not change their counts. */
    static final List<MutationOperator> FIXTURE_OPERATORS = Operators.named(List.of("relational-subset", "relational-all"));

    private RunFixtures() {
    }

    public static Generation.Generated generate(SourceFile... files) {
        return Generation.generate(List.of(files), MutantRequest.firstOrder(FIXTURE_OPERATORS));
    }

    /** A complete, unsampled run over the whole project in which every mutant survived. */
    public static RunResults runOf(Generation.Generated generated) {
        return runOf(generated, settings(false, null));
    }

    public static RunResults runOf(Generation.Generated generated, RunSettings settings) {
        List<MutantResult> mutants = generated.mutants().stream()
                .map(mutant -> result(mutant, generated.files().get(mutant.file()).text())).toList();
        Map<String, String> hashes = generated.files().keySet().stream()
                .collect(Collectors.toMap(path -> path, path -> "0".repeat(64)));
        return new RunResults(RunResults.FORMAT, true, settings, List.of(), Map.of(), mutants, List.of(), hashes);
    }

    public static RunSettings settings(boolean sampled, String changeScope) {
        return new RunSettings("/project", FIXTURE_OPERATORS.stream().map(MutationOperator::id).toList(), List.of(1),
                "method", 1L, sampled, 0, changeScope, 1, 2.0, 1000L, List.of(), List.of(), List.of(), "2g", null, null, 500, false, 0,
                false, null);
    }

    public static MutantResult result(Mutant mutant, String fileText) {
        List<PointRecord> points = mutant.points().stream().map(point -> record(point, fileText)).toList();
        return new MutantResult(mutant.fingerprint(), mutant.file(), mutant.order(), points, Verdict.SURVIVED, null, null,
                List.of(), List.of(), 0.0, "");
    }

    private static PointRecord record(Point point, String fileText) {
        return new PointRecord(point.fingerprint(), point.operator(), point.type(), point.member(), point.line(), 1,
                point.line(), 1, fileText.substring(point.edit().begin(), point.edit().end()), point.replacement(),
                point.snippet(), point.description());
    }
}
