package dev.changeling.review;

import dev.changeling.results.CompiledAlike;
import dev.changeling.results.MutantResult;
import dev.changeling.results.RunResults;
import java.util.HashMap;
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

    private final Map<String, String> asOriginal;
    private final Map<String, MutantResult> byId;
    /** For each duplicate that is not the first of its group, the first. */
    private final Map<String, String> standsFor = new HashMap<>();
    /** For the first of each group, the others. */
    private final Map<String, List<String>> groups = new HashMap<>();

    private SameClasses(CompiledAlike alike, Map<String, MutantResult> byId) {
        this.asOriginal = alike.asOriginal();
        this.byId = byId;
        for (List<String> group : alike.duplicates()) {
            List<String> others = group.subList(1, group.size());
            groups.put(group.get(0), others);
            others.forEach(id -> standsFor.put(id, group.get(0)));
        }
    }

    public static SameClasses of(RunResults results) {
        List<MutantResult> mutants = results.mutants() == null ? List.of() : results.mutants();
        return new SameClasses(results.compiledAlike(),
                mutants.stream().collect(Collectors.toMap(MutantResult::id, Function.identity(), (first, second) -> first)));
    }

    /** The reason to list it as equivalent with, when it compiles to the original's classes. */
    public Optional<String> proposedReason(MutantResult mutant) {
        return Optional.ofNullable(asOriginal.get(mutant.id())).map(match -> "bytes".equals(match)
                ? "compiles to the same bytes as the original (javac, no debug information)"
                : "compiles to the original's classes once constant-pool order and unreachable code are set aside");
    }

    /** Whether another survivor, with the very same classes, stands for it. */
    public boolean isDuplicate(MutantResult mutant) {
        return standingFor(mutant).isPresent();
    }

    /** The id of the survivor with its very classes that stands for it, when it is a duplicate. */
    public Optional<String> standingFor(MutantResult mutant) {
        return Optional.ofNullable(standsFor.get(mutant.id()));
    }

    /** The survivors it stands for: others of its file that compile to its very classes. */
    public List<MutantResult> duplicatesOf(MutantResult mutant) {
        return groups.getOrDefault(mutant.id(), List.of()).stream().map(byId::get).filter(Objects::nonNull).toList();
    }

    /** A short note for a one-line listing: "  (proposed equivalent)", "  (same classes as 1a2b3c4d)", or empty. */
    public String note(MutantResult mutant) {
        if (asOriginal.containsKey(mutant.id())) {
            return "  (proposed equivalent)";
        }
        return standingFor(mutant).map(byId::get).map(first -> "  (same classes as " + first.shortId() + ")").orElse("");
    }

    /** How many proposed equivalents and duplicates among {@code shown}, as a clause; empty when neither. */
    public Optional<String> clause(List<MutantResult> shown) {
        long proposed = shown.stream().filter(mutant -> asOriginal.containsKey(mutant.id())).count();
        long duplicates = shown.stream().filter(this::isDuplicate).count();
        if (proposed == 0 && duplicates == 0) {
            return Optional.empty();
        }
        return Optional.of(proposed + " proposed equivalent (compiled to the original's classes), "
                + duplicates + (duplicates == 1 ? " duplicate" : " duplicates") + " of another survivor");
    }
}
