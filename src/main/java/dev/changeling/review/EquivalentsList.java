package dev.changeling.review;

import dev.changeling.Text;
import dev.changeling.AtomicFiles;
import dev.changeling.UserError;
import dev.changeling.results.MutantResult;
import dev.changeling.results.PointRecord;
import dev.changeling.results.RunResults;
import dev.changeling.results.RunSettings;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collection;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * The project's committed list of mutants judged equivalent ({@code .changeling/equivalent-mutants.txt}):
 * loaded strictly, changed in memory, saved atomically, and never written over a file that changed
 * or could not be read since it was loaded.
 */
public final class EquivalentsList {

    public static final String FILE_NAME = "equivalent-mutants.txt";

    private final Path projectRoot;
    private final Path file;
    private byte[] onDisk;
    private final List<String> header;
    private final Map<String, EquivalentEntry> entries = new LinkedHashMap<>();

    private EquivalentsList(Path projectRoot, byte[] onDisk, EquivalentsFormat.Parsed parsed) {
        this.projectRoot = projectRoot;
        this.file = in(projectRoot);
        this.onDisk = onDisk;
        this.header = parsed.header();
        parsed.entries().forEach(entry -> entries.put(entry.fingerprint(), entry));
    }

    /** Where a project keeps the list. */
    public static Path in(Path projectRoot) {
        return ChangelingFolder.of(projectRoot).resolve(FILE_NAME);
    }

    /** The project's list, empty when it has none yet; a file that cannot be read fully is a user mistake. */
    public static EquivalentsList load(Path projectRoot) {
        Path root = projectRoot.toAbsolutePath().normalize();
        Path file = in(root);
        byte[] bytes = read(file);
        EquivalentsFormat.Parsed parsed = bytes == null
                ? new EquivalentsFormat.Parsed(List.of(), List.of())
                : EquivalentsFormat.parse(bytes, shown(root, file));
        return new EquivalentsList(root, bytes, parsed);
    }

    public Path file() {
        return file;
    }

    /** Every entry, in the order of the file. */
    public List<EquivalentEntry> entries() {
        return entries.values().stream().sorted(EquivalentEntry.ORDER).toList();
    }

    public boolean contains(String fingerprint) {
        return entries.containsKey(fingerprint);
    }

    public Optional<EquivalentEntry> find(String fingerprint) {
        return Optional.ofNullable(entries.get(fingerprint));
    }

    /** The entries whose fingerprint starts with a prefix (a short id), for commands that take one. */
    public List<EquivalentEntry> startingWith(String prefix) {
        return entries().stream().filter(entry -> entry.fingerprint().startsWith(prefix)).toList();
    }

    /** Adds an entry, or replaces the one with the same fingerprint; returns the one replaced. */
    public Optional<EquivalentEntry> put(EquivalentEntry entry) {
        return Optional.ofNullable(entries.put(entry.fingerprint(), entry));
    }

    public Optional<EquivalentEntry> remove(String fingerprint) {
        return Optional.ofNullable(entries.remove(fingerprint));
    }

    /** Removes the entries with these fingerprints; returns those that were there. */
    public List<EquivalentEntry> removeAll(Collection<String> fingerprints) {
        List<EquivalentEntry> removed = new ArrayList<>();
        for (String fingerprint : fingerprints) {
            remove(fingerprint).ifPresent(removed::add);
        }
        return removed;
    }

    /**
     * The entries that no longer match a mutant of the run. Only a complete, unsampled run of the
     * whole project can tell: anything less leaves out mutants that still exist.
     */
    public Staleness stale(RunResults run) {
        RunSettings settings = run.settings();
        if (!run.complete()) {
            throw new UserError("the last run was interrupted, so it lacks mutants that may still exist; "
                    + "run 'changeling run' to the end before looking for stale entries");
        }
        if (settings != null && settings.sampled()) {
            throw new UserError("the last run was a sample of the mutants; stale entries can only be told from "
                    + "a run of all of them: run again without a sample");
        }
        if (settings != null && settings.changeScope() != null) {
            throw new UserError("the last run was limited to " + settings.changeScope() + "; stale entries can only be "
                    + "told from a run over the whole project: run again without limiting it to a change");
        }
        Set<String> made = new HashSet<>();
        Set<String> files = new HashSet<>();
        for (MutantResult mutant : orEmpty(run.mutants())) {
            made.add(mutant.id());
            files.add(mutant.file());
            orEmpty(mutant.points()).stream().map(PointRecord::fingerprint).forEach(made::add);
        }
        if (run.sourceHashes() != null) {
            files.addAll(run.sourceHashes().keySet());
        }
        Set<String> operators = settings == null ? Set.of() : new HashSet<>(orEmpty(settings.operators()));
        Set<Integer> orders = settings == null ? Set.of(1) : new HashSet<>(orEmpty(settings.orders()));
        List<EquivalentEntry> stale = new ArrayList<>();
        List<EquivalentEntry> unchecked = new ArrayList<>();
        for (EquivalentEntry entry : entries()) {
            if (!Files.isRegularFile(projectRoot.resolve(entry.file()))) {
                stale.add(entry);
            } else if (made.contains(entry.fingerprint())) {
                continue;
            } else if (!files.contains(entry.file()) || !operators.containsAll(entry.operators())
                    || (entry.order() > 1 && !orders.contains(entry.order()))) {
                unchecked.add(entry);
            } else {
                stale.add(entry);
            }
        }
        return new Staleness(stale, unchecked);
    }

    /**
     * Writes the list, sorted, through a temporary file. Refuses when the file changed on disk since
     * it was loaded (a merge, an editor, another command), and checks that what it is about to write
     * reads back to the same entries.
     */
    public void save() {
        byte[] current = read(file);
        if (!Arrays.equals(current, onDisk)) {
            throw new UserError(shown(projectRoot, file) + ": changed on disk since it was read; nothing was written. "
                    + "Run the command again");
        }
        String text = EquivalentsFormat.render(header, entries.values());
        byte[] bytes = text.getBytes(StandardCharsets.UTF_8);
        if (Arrays.equals(bytes, current) || (current == null && entries.isEmpty())) {
            return;
        }
        List<EquivalentEntry> readBack = EquivalentsFormat.parse(bytes, file.toString()).entries();
        if (!readBack.equals(entries())) {
            throw new IllegalStateException("the equivalents list would not read back as written; nothing was written");
        }
        try {
            ChangelingFolder.ensure(projectRoot);
            AtomicFiles.write(file, out -> out.write(bytes));
        } catch (IOException e) {
            throw new UserError(shown(projectRoot, file) + ": cannot write (" + e.getMessage() + "); the list on disk is unchanged");
        }
        onDisk = bytes;
    }

    private static byte[] read(Path file) {
        if (!Files.exists(file)) {
            return null;
        }
        try {
            return Files.readAllBytes(file);
        } catch (IOException e) {
            throw new UserError(file + ": cannot read (" + e.getMessage() + "); check its permissions");
        }
    }

    private static String shown(Path root, Path file) {
        return Text.relative(root, file);
    }

    private static <T> List<T> orEmpty(List<T> list) {
        return list == null ? List.of() : list;
    }
}
