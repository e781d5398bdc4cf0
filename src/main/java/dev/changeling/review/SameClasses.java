package dev.changeling.review;

import dev.changeling.results.CompiledAlike;
import dev.changeling.results.MutantResult;
import dev.changeling.results.RunResults;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.function.Function;
import java.util.stream.Collectors;

/**
 * What the views say about survivors that compile alike: a proposed equivalent (the original's classes) is shown with
 * the reason a person can accept; a duplicate (another survivor's classes) is shown once, through the survivor that
 * stands for its group.
 */
public final class SameClasses {

    private final CompiledAlike alike;
    private final Map<String, MutantResult> byId;

    private SameClasses(CompiledAlike alike, Map<String, MutantResult> byId) {
        this.alike = alike;
        this.byId = byId;
    }

    public static SameClasses of(RunResults results) {
        List<MutantResult> mutants = results.mutants() == null ? List.of() : results.mutants();
        return new SameClasses(results.compiledAlike(),
                mutants.stream().collect(Collectors.toMap(MutantResult::id, Function.identity(), (first, second) -> first)));
    }

    /** The reason to list it as equivalent with, when it compiles to the original's classes. */
    public Optional<String> proposedReason(MutantResult mutant) {
        return alike.asOriginal(mutant.id()).map(match -> "bytes".equals(match)
                ? "compiles to the same bytes as the original (javac, no debug information)"
                : "compiles to the original's classes once constant-pool order and unreachable code are set aside");
    }

    /** Whether another survivor, with the very same classes, stands for it. */
    public boolean isDuplicate(MutantResult mutant) {
        return standingFor(mutant).isPresent();
    }

    /** The id of the survivor with its very classes that stands for it, when it is a duplicate. */
    public Optional<String> standingFor(MutantResult mutant) {
        return alike.duplicateOf(mutant.id());
    }

    /** The survivors it stands for: others of its file that compile to its very classes. */
    public List<MutantResult> duplicatesOf(MutantResult mutant) {
        return alike.duplicatesOf(mutant.id()).stream().map(byId::get).filter(Objects::nonNull).toList();
    }

    /** A short note for a one-line listing: "  (proposed equivalent)", "  (same classes as 1a2b3c4d)", or empty. */
    public String note(MutantResult mutant) {
        if (alike.asOriginal(mutant.id()).isPresent()) {
            return "  (proposed equivalent)";
        }
        return standingFor(mutant).map(first -> "  (same classes as " + first.substring(0, Math.min(8, first.length())) + ")").orElse("");
    }

    /** How many proposed equivalents and duplicates among {@code shown}, as a clause; empty when neither. */
    public Optional<String> clause(List<MutantResult> shown) {
        long proposed = shown.stream().filter(mutant -> alike.asOriginal(mutant.id()).isPresent()).count();
        long duplicates = shown.stream().filter(this::isDuplicate).count();
        if (proposed == 0 && duplicates == 0) {
            return Optional.empty();
        }
        return Optional.of(proposed + " proposed equivalent (compiled to the original's classes), "
                + duplicates + (duplicates == 1 ? " duplicate" : " duplicates") + " of another survivor");
    }
}
