package dev.changeling.recall;

import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import dev.changeling.AtomicFiles;
import dev.changeling.Text;
import dev.changeling.mutant.Mutant;
import dev.changeling.results.MutantResult;
import dev.changeling.results.Records;
import dev.changeling.results.Verdict;
import dev.changeling.source.SourceFile;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeMap;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.Consumer;
import java.util.function.Predicate;

/**
 * The verdicts and comparisons of earlier runs, each under the key of what it depended on ({@link VerdictKeys}), kept in
 * one file below the build folder. A verdict is given again only under an equal key, so a warm run gives the verdicts a
 * cold run of the same tree gives. What each verdict depended on:
 * <ul>
 *   <li>a survivor: every test that ran against it, which must be every test that would run now (a new test that
 *   reaches it, or a changed one, runs it again);</li>
 *   <li>a killed or timed-out mutant: the test that failed or was stopped, which must still be one that would run;</li>
 *   <li>with every test run (the kill matrix): every test, as for a survivor;</li>
 *   <li>a crashed mutant is never kept: a crash can come from outside; nor is one whose worker was ended at a deadline
 *   before it could say which methods the run entered.</li>
 * </ul>
 * A file that cannot be read, of another format or of another program, is set aside with a notice and the run goes on
 * without it; the file is replaced whole (written beside, then renamed), so two runs at once leave one of them.
 */
public final class Recall {

    public static final int FORMAT = 2;
    public static final String FILE_NAME = "recall.json";

    private static final ObjectMapper JSON = new ObjectMapper()
            .enable(SerializationFeature.ORDER_MAP_ENTRIES_BY_KEYS)
            .disable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES);

    /**
     * A verdict as kept: the key, the tests that decided it, the methods its run entered (by their place in the file's
     * list of methods), and what the results file records for it.
     */
    record KeptVerdict(String key, String file, Verdict verdict, List<String> decidedBy, int[] entered, String killedBy,
                       String detail, List<String> testsRun, double millis, List<String> killers) {
    }

    /**
     * A survivor's comparison as kept: how it matched the original ({@code bytes}, {@code shape}), else the digest of its
     * classes' shape; neither when it did not compile on its own.
     */
    public record KeptComparison(String key, String file, String match, String shape) {
    }

    /** The file's layout: every method a kept verdict's run entered is named once, in {@code methods}. */
    record Contents(int format, List<String> methods, Map<String, KeptVerdict> verdicts, Map<String, KeptComparison> comparisons) {
    }

    private final Path file;
    private final List<String> methods;
    private final Map<String, Integer> methodIds = new HashMap<>();
    private final Map<String, KeptVerdict> verdicts;
    private final Map<String, KeptComparison> comparisons;
    private final boolean giving;

    private Recall(Path file, Contents contents) {
        this(file, contents.methods(), contents.verdicts(), contents.comparisons(), true);
    }

    private Recall(Path file, List<String> methods, Map<String, KeptVerdict> verdicts, Map<String, KeptComparison> comparisons,
                   boolean giving) {
        this.giving = giving;
        this.file = file;
        this.methods = new ArrayList<>(methods);
        this.methods.forEach(name -> methodIds.putIfAbsent(name, methodIds.size()));
        this.verdicts = new ConcurrentHashMap<>(verdicts);
        this.comparisons = new ConcurrentHashMap<>(comparisons);
    }

    private static Recall empty(Path file) {
        return new Recall(file, new Contents(FORMAT, List.of(), Map.of(), Map.of()));
    }

    /** What the file keeps; nothing when there is no file, or, after a one-line notice, when it cannot be trusted. */
    public static Recall open(Path file, Consumer<String> notice) {
        if (!Files.isRegularFile(file)) {
            return empty(file);
        }
        try {
            Contents contents = JSON.readValue(file.toFile(), Contents.class);
            if (contents.format() != FORMAT || contents.methods() == null || contents.verdicts() == null
                    || contents.comparisons() == null) {
                notice.accept(file + ": not a file of this version (format " + contents.format() + ", not " + FORMAT
                        + "); set aside, every mutant runs and it is written again");
                return empty(file);
            }
            return new Recall(file, contents);
        } catch (IOException | RuntimeException e) {
            notice.accept(file + ": cannot read it (" + Text.firstLine(String.valueOf(e.getMessage()))
                    + "); set aside, every mutant runs and it is written again");
            return empty(file);
        }
    }

    /** The same file, giving nothing back: every mutant runs and is compared, and what is found is kept as usual. */
    public Recall withoutGiving() {
        return new Recall(file, methods, verdicts, comparisons, false);
    }

    /**
     * The verdict kept for the mutant, when its key is the one {@code tests} (the tests that would run now) give.
     *
     * @param reachedBy  the tests that reach it now, as the results file records them
     * @param infectedBy the tests that infect it now, or null when not watched
     */
    public Optional<MutantResult> verdict(Mutant mutant, SourceFile file, List<String> tests, boolean everyTest,
                                          VerdictKeys keys, List<String> reachedBy, List<String> infectedBy) {
        KeptVerdict kept = giving ? verdicts.get(mutant.fingerprint()) : null;
        if (kept == null || kept.entered() == null || kept.decidedBy() == null) {
            return Optional.empty();
        }
        Collection<String> decidedBy = decidingAll(kept.verdict(), everyTest) ? tests : kept.decidedBy();
        if (!Set.copyOf(tests).containsAll(decidedBy)
                || !kept.key().equals(keys.forVerdict(mutant, file.text(), decidedBy, namesOf(kept.entered())))) {
            return Optional.empty();
        }
        MutantResult base = Records.of(mutant, file, kept.verdict(), kept.detail());
        Set<String> runnable = Set.copyOf(tests);
        return Optional.of(new MutantResult(base.id(), base.file(), base.order(), base.points(), kept.verdict(), kept.killedBy(),
                kept.detail(), kept.testsRun().stream().filter(runnable::contains).toList(), reachedBy, kept.millis(), base.diff(),
                kept.killers(), infectedBy));
    }

    /**
     * Keeps a verdict the tests just gave, under the key of the tests that decided it (for a survivor, or with every test
     * run, the tests it ran: a survivor runs every test it is given) and of the methods its run entered.
     *
     * @param entered the names of the schema's methods the run entered; null when the worker did not say (it was
     *                ended at a deadline), and then the verdict is not kept
     */
    public void keep(Mutant mutant, SourceFile file, MutantResult result, List<String> entered, boolean everyTest, VerdictKeys keys) {
        boolean all = decidingAll(result.verdict(), everyTest);
        if (result.verdict() == Verdict.CRASHED || entered == null || !all && result.killedBy() == null) {
            verdicts.remove(mutant.fingerprint());
            return;
        }
        List<String> decidedBy = all ? result.testsRun() : List.of(result.killedBy());
        verdicts.put(mutant.fingerprint(), new KeptVerdict(keys.forVerdict(mutant, file.text(), decidedBy, entered), mutant.file(),
                result.verdict(), all ? List.of() : decidedBy, idsOf(entered), result.killedBy(),
                result.detail(), result.testsRun(), result.millis(), result.killers()));
    }

    private synchronized int[] idsOf(List<String> names) {
        return names.stream().mapToInt(name -> methodIds.computeIfAbsent(name, unknown -> {
            methods.add(name);
            return methods.size() - 1;
        })).toArray();
    }

    private synchronized List<String> namesOf(int[] ids) {
        return java.util.Arrays.stream(ids).mapToObj(id -> id >= 0 && id < methods.size() ? methods.get(id) : "unknown method " + id).toList();
    }

    private static boolean decidingAll(Verdict verdict, boolean everyTest) {
        return everyTest || verdict == Verdict.SURVIVED;
    }

    /** The comparison kept for the survivor, when its key is today's. */
    public Optional<KeptComparison> comparison(Mutant mutant, SourceFile file, VerdictKeys keys) {
        KeptComparison kept = giving ? comparisons.get(mutant.fingerprint()) : null;
        return kept != null && kept.key().equals(keys.forComparison(mutant, file.text())) ? Optional.of(kept) : Optional.empty();
    }

    /** Keeps what comparing the survivor found: {@code match} or {@code shape}, or neither when it did not compile. */
    public void keep(Mutant mutant, SourceFile file, String match, String shape, VerdictKeys keys) {
        comparisons.put(mutant.fingerprint(), new KeptComparison(keys.forComparison(mutant, file.text()), mutant.file(), match, shape));
    }

    /** How many verdicts it keeps. */
    public int size() {
        return verdicts.size();
    }

    /**
     * Writes the file again: what this run kept, and what earlier runs kept for files that still exist ({@code exists}
     * by project-relative path). A failure to write is a notice; the run's results do not depend on it.
     */
    public void save(Predicate<String> exists, Consumer<String> notice) {
        if (file == null) {
            return;
        }
        Map<String, KeptVerdict> keptVerdicts = new TreeMap<>();
        verdicts.forEach((id, kept) -> {
            if (exists.test(kept.file())) {
                keptVerdicts.put(id, kept);
            }
        });
        Map<String, KeptComparison> keptComparisons = new TreeMap<>();
        comparisons.forEach((id, kept) -> {
            if (exists.test(kept.file())) {
                keptComparisons.put(id, kept);
            }
        });
        try {
            Files.createDirectories(file.getParent());
            List<String> names;
            synchronized (this) {
                names = List.copyOf(methods);
            }
            AtomicFiles.write(file, out -> JSON.writeValue(out, new Contents(FORMAT, names, keptVerdicts, keptComparisons)));
        } catch (IOException | RuntimeException e) {
            notice.accept(file + ": could not write it (" + Text.firstLine(String.valueOf(e.getMessage()))
                    + "); the next run runs every mutant again");
        }
    }
}
