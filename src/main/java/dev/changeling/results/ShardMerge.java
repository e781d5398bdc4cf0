package dev.changeling.results;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.changeling.ExitCode;
import dev.changeling.UserError;
import dev.changeling.mutant.Shard;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * Puts the results of the N shards of one run ({@code run --shard I/N}) back together into the results one unsharded
 * run gives, after checking that they are all the shards of one run, each once.
 *
 * <p>What the shards share (the settings, the suppression counts, the problems, the suite as the baseline ran it) is
 * taken from shard 1, each test's baseline time included; the mutants are put back in the run's order; each phase's
 * time is summed over the shards; the survivors compiled alike are grouped again across the shards.
 */
public final class ShardMerge {

    /** Settings that may differ from one shard's machine to another's without changing a verdict. */
    private static final Set<String> PER_MACHINE = Set.of("workers");

    private static final ObjectMapper JSON = new ObjectMapper();

    private ShardMerge() {
    }

    /** One shard's results and the file they were read from, which messages name. */
    public record Part(Path file, RunResults results) {
    }

    /**
     * The results of the whole run.
     *
     * @throws UserError with {@link ExitCode#SHARDS_APART}, one line naming the file and saying what is wrong and what to
     *                   do, when a file is not a shard's, a shard is missing or given twice, or the shards come from
     *                   different runs (cut into other numbers, other mutants, settings, sources or tests)
     */
    public static RunResults merge(List<Part> parts) {
        List<Part> shards = inOrder(parts);
        Part first = shards.get(0);
        for (Part shard : shards.subList(1, shards.size())) {
            requireSameRun(shard, first);
        }
        shards.forEach(ShardMerge::requireOwnShare);
        return joined(shards);
    }

    /** The shards by index, once it is known that each of 1 to N is there exactly once. */
    private static List<Part> inOrder(List<Part> parts) {
        Part reference = parts.get(0);
        Map<Integer, Part> byIndex = new TreeMap<>();
        for (Part part : parts) {
            ShardRecord shard = part.results().shard();
            if (shard == null) {
                throw apart(part.file() + ": these are the results of a whole run, not of a shard; give the results files of"
                        + " the runs with --shard I/N, one per shard");
            }
            int count = reference.results().shard().count();
            if (shard.count() != count) {
                throw apart(part.file() + ": shard " + shard.label() + " is of a run cut into " + shard.count() + " shards, but "
                        + reference.file() + " is of one cut into " + count + "; give the shards of one run");
            }
            Part earlier = byIndex.putIfAbsent(shard.index(), part);
            if (earlier != null) {
                throw apart(part.file() + ": shard " + shard.label() + " is given twice (also " + earlier.file()
                        + "); give each shard's results file once");
            }
        }
        int count = reference.results().shard().count();
        List<String> missing = new ArrayList<>();
        for (int index = 1; index <= count; index++) {
            if (!byIndex.containsKey(index)) {
                missing.add(index + "/" + count);
            }
        }
        if (!missing.isEmpty()) {
            throw apart("shard " + String.join(", ", missing) + (missing.size() == 1 ? " is" : " are") + " missing: "
                    + byIndex.size() + " of " + count + " shards given (" + String.join(", ", byIndex.values().stream()
                    .map(part -> part.results().shard().label()).toList()) + "); give the results files of all " + count
                    + " shards, or run the missing ones");
        }
        return List.copyOf(byIndex.values());
    }

    /** Refuses a shard of another run than the first shard's: other mutants, settings, sources or tests. */
    private static void requireSameRun(Part shard, Part first) {
        RunResults ours = shard.results();
        RunResults theirs = first.results();
        String which = shard.file() + ": shard " + ours.shard().label();
        String against = " than shard " + theirs.shard().label() + " (" + first.file() + ")";
        if (!ours.shard().selection().equals(theirs.shard().selection())) {
            throw apart(which + " was cut from other mutants (" + ours.shard().selection().size() + ", against "
                    + theirs.shard().selection().size() + ")" + against + "; run every shard on the same revision with the same options");
        }
        differingSetting(ours.settings(), theirs.settings()).ifPresent(field -> {
            throw apart(which + " was run with another " + field + against + "; run every shard with the same options");
        });
        differingKey(ours.sourceHashes(), theirs.sourceHashes()).ifPresent(path -> {
            throw apart(which + " was run on another version of " + path + against + "; run every shard on the same revision");
        });
        differingKey(testIds(ours), testIds(theirs)).ifPresent(test -> {
            throw apart(which + "'s baseline ran other tests" + against + ", " + test + " in one only;"
                    + " run every shard on the same revision with the same options");
        });
    }

    /** Refuses a shard that holds a mutant outside its share of the run: a file edited, or not a shard's as written. */
    private static void requireOwnShare(Part part) {
        ShardRecord record = part.results().shard();
        Shard shard = new Shard(record.index(), record.count());
        Set<String> selection = new HashSet<>(record.selection());
        for (MutantResult mutant : part.results().mutants()) {
            if (!selection.contains(mutant.id()) || !shard.holds(mutant.id())) {
                throw apart(part.file() + ": mutant " + mutant.shortId() + " is not in shard " + record.label()
                        + "; give the results files as the shards' runs wrote them");
            }
        }
    }

    private static RunResults joined(List<Part> shards) {
        RunResults first = shards.get(0).results();
        List<String> order = first.shard().selection();
        Map<String, MutantResult> byId = new LinkedHashMap<>();
        shards.forEach(shard -> shard.results().mutants().forEach(mutant -> byId.put(mutant.id(), mutant)));
        List<MutantResult> mutants = order.stream().map(byId::get).filter(Objects::nonNull).toList();
        Set<String> mutated = new HashSet<>(mutants.stream().map(MutantResult::file).toList());
        Map<String, String> hashes = new TreeMap<>(first.sourceHashes());
        hashes.keySet().retainAll(mutated);
        Map<String, Double> timings = new LinkedHashMap<>();
        shards.forEach(shard -> shard.results().timings().forEach((phase, millis) -> timings.merge(phase, millis, Double::sum)));
        boolean complete = shards.stream().allMatch(shard -> shard.results().complete());
        CompiledAlike alike = CompiledAlike.regrouped(shards.stream().map(shard -> shard.results().compiledAlike()).toList(), order);
        return new RunResults(first.format(), complete, first.settings(), first.tests(), timings, mutants, first.problems(),
                hashes, first.notMade(), alike, null, first.modules());
    }

    /** The first setting (by its name in the results file) in which two runs differ, leaving out {@link #PER_MACHINE}. */
    private static Optional<String> differingSetting(RunSettings one, RunSettings other) {
        ObjectNode ours = JSON.valueToTree(one);
        ObjectNode theirs = JSON.valueToTree(other);
        ours.remove(PER_MACHINE);
        theirs.remove(PER_MACHINE);
        for (Iterator<String> names = ours.fieldNames(); names.hasNext(); ) {
            String name = names.next();
            JsonNode value = ours.get(name);
            if (!value.equals(theirs.get(name))) {
                return Optional.of("setting " + name + " (" + value + ", not " + theirs.get(name) + ")");
            }
        }
        return Optional.empty();
    }

    /** The first key, in sorted order, that one map has and the other has not or has with another value. */
    private static Optional<String> differingKey(Map<String, String> one, Map<String, String> other) {
        Set<String> keys = new TreeSet<>(one.keySet());
        keys.addAll(other.keySet());
        return keys.stream().filter(key -> !Objects.equals(one.get(key), other.get(key))).findFirst();
    }

    /** The baseline's tests by id, as a map {@link #differingKey} compares. */
    private static Map<String, String> testIds(RunResults results) {
        Map<String, String> ids = new TreeMap<>();
        results.tests().forEach(test -> ids.put(test.id(), test.id()));
        return ids;
    }

    private static UserError apart(String message) {
        return new UserError(message, ExitCode.SHARDS_APART);
    }
}
