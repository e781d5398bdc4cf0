package dev.changeling.review;

import dev.changeling.Text;
import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonValue;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import dev.changeling.AtomicFiles;
import dev.changeling.UserError;
import java.util.Objects;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import dev.changeling.results.MutantResult;
import dev.changeling.results.Verdict;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.Arrays;
import java.util.Collections;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

/**
 * The triage decisions that stay on this machine ({@code .changeling/local/triage.json}): which
 * survivors need a test and which were fixed. Every decision is written at once, atomically, so a
 * crash loses none; a file that cannot be read is never written over.
 */
public final class TriageMarks {

    public static final String FILE_NAME = "triage.json";
    static final int FORMAT = 1;

    private static final ObjectMapper JSON = new ObjectMapper()
            .enable(SerializationFeature.INDENT_OUTPUT)
            .enable(SerializationFeature.ORDER_MAP_ENTRIES_BY_KEYS)
            .disable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
            .setSerializationInclusion(JsonInclude.Include.NON_NULL);

    /** What the developer decided about a surviving mutant, short of calling it equivalent. */
    public enum Kind {
        /** The tests should notice this mutant; a test is still to be written. */
        NEEDS_TEST,
        /** A test or a code change now deals with it. */
        FIXED;

        @JsonValue
        public String word() {
            return name().toLowerCase(Locale.ROOT).replace('_', '-');
        }

        public static Optional<Kind> byWord(String word) {
            return Arrays.stream(values()).filter(kind -> kind.word().equals(word)).findFirst();
        }
    }

    /** One decision: what, when, and an optional note. */
    public record Mark(Kind kind, Instant at, String note) {

        /**
         * Whether the mark still stands against results written at {@code resultsWritten}. A fixed mark says a
         * re-run killed the mutant in the code of its day; a run made after it measured the code again, so there
         * the mark stands only if that run does not find the mutant surviving. Every other mark always stands.
         */
        public boolean standsFor(MutantResult mutant, Instant resultsWritten) {
            return kind != Kind.FIXED || at.isAfter(resultsWritten) || mutant.verdict() != Verdict.SURVIVED;
        }

        /** Why a fixed mark no longer stands, for the one who made it. */
        public String lapse() {
            return "marked fixed " + at.truncatedTo(java.time.temporal.ChronoUnit.MINUTES)
                    + ", but the run since finds it survives again (the test that killed it may be gone): decide again";
        }
    }

    /** The file's layout: times as ISO-8601 text, so the file reads well and needs no extra Jackson module. */
    record Stored(int format, Map<String, StoredMark> marks) {
    }

    record StoredMark(String mark, String at, String note) {
    }

    private final Path projectRoot;
    private final Path file;
    private final Clock clock;
    private final Map<String, Mark> marks;
    private byte[] onDisk;

    private TriageMarks(Path projectRoot, Clock clock, Map<String, Mark> marks, byte[] onDisk) {
        this.projectRoot = projectRoot;
        this.file = in(projectRoot);
        this.clock = clock;
        this.marks = marks;
        this.onDisk = onDisk;
    }

    public static Path in(Path projectRoot) {
        return ChangelingFolder.of(projectRoot).resolve(ChangelingFolder.LOCAL).resolve(FILE_NAME);
    }

    public static TriageMarks open(Path projectRoot) {
        return open(projectRoot, Clock.systemUTC());
    }

    static TriageMarks open(Path projectRoot, Clock clock) {
        Path root = projectRoot.toAbsolutePath().normalize();
        Path file = in(root);
        byte[] bytes = read(root, file);
        return new TriageMarks(root, clock, bytes == null ? new TreeMap<>() : parse(root, file, bytes), bytes);
    }

    public Optional<Mark> get(String fingerprint) {
        return Optional.ofNullable(marks.get(fingerprint));
    }

    /** Every mark by fingerprint, sorted. */
    public Map<String, Mark> all() {
        return Collections.unmodifiableMap(marks);
    }

    /** Records a decision now and writes the file before returning. */
    public Mark mark(String fingerprint, Kind kind, String note) {
        if (!EquivalentEntry.isFingerprint(fingerprint)) {
            throw new IllegalArgumentException("not a full fingerprint: " + fingerprint);
        }
        Mark mark = new Mark(kind, clock.instant(), note == null || note.isBlank() ? null : note.strip());
        Mark previous = marks.put(fingerprint, mark);
        try {
            save();
        } catch (RuntimeException e) {
            restore(fingerprint, previous);
            throw e;
        }
        return mark;
    }

    /** Forgets the decision about a mutant, writing the file at once; false when there was none. */
    public boolean clear(String fingerprint) {
        Mark previous = marks.remove(fingerprint);
        if (previous == null) {
            return false;
        }
        try {
            save();
        } catch (RuntimeException e) {
            restore(fingerprint, previous);
            throw e;
        }
        return true;
    }

    private void restore(String fingerprint, Mark previous) {
        if (previous == null) {
            marks.remove(fingerprint);
        } else {
            marks.put(fingerprint, previous);
        }
    }

    private void save() {
        byte[] current = read(projectRoot, file);
        if (!Arrays.equals(current, onDisk)) {
            throw new UserError(shown() + ": changed on disk since it was read (another changeling command?); "
                    + "nothing was written. Run the command again");
        }
        Map<String, StoredMark> stored = new TreeMap<>();
        marks.forEach((fingerprint, mark) -> stored.put(fingerprint,
                new StoredMark(mark.kind().word(), mark.at().toString(), mark.note())));
        byte[] bytes;
        try {
            bytes = JSON.writeValueAsBytes(new Stored(FORMAT, stored));
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot render the triage marks", e);
        }
        if (!parse(projectRoot, file, bytes).equals(marks)) {
            throw new IllegalStateException("the triage marks would not read back as written; nothing was written");
        }
        try {
            ChangelingFolder.ensureLocal(projectRoot);
            AtomicFiles.write(file, out -> out.write(bytes));
        } catch (IOException e) {
            throw new UserError(shown() + ": cannot write (" + e.getMessage() + "); the marks on disk are unchanged");
        }
        onDisk = bytes;
    }

    private static Map<String, Mark> parse(Path root, Path file, byte[] bytes) {
        String where = Text.relative(root, file);
        Stored stored;
        try {
            stored = JSON.readValue(bytes, Stored.class);
        } catch (IOException e) {
            throw new UserError(where + ": cannot read the triage marks (" + Text.firstLine(Objects.requireNonNullElse(e.getMessage(), "unreadable"))
                    + "); repair the file, or delete it to start triage afresh");
        }
        if (stored == null || stored.format() != FORMAT) {
            throw new UserError(where + ": triage marks of format " + (stored == null ? "none" : stored.format())
                    + ", expected " + FORMAT + "; repair the file, or delete it to start triage afresh");
        }
        Map<String, Mark> marks = new TreeMap<>();
        if (stored.marks() == null) {
            return marks;
        }
        for (Map.Entry<String, StoredMark> entry : stored.marks().entrySet()) {
            StoredMark mark = entry.getValue();
            String what = where + ": the mark of " + entry.getKey();
            if (!EquivalentEntry.isFingerprint(entry.getKey())) {
                throw new UserError(where + ": '" + entry.getKey() + "' is not a full fingerprint; repair the file, or delete it");
            }
            if (mark == null || mark.mark() == null || Kind.byWord(mark.mark()).isEmpty()) {
                throw new UserError(what + " is not one of needs-test, fixed; repair the file, or delete it");
            }
            Instant at;
            try {
                at = Instant.parse(mark.at());
            } catch (DateTimeParseException | NullPointerException e) {
                throw new UserError(what + " has no readable time ('" + mark.at() + "'); repair the file, or delete it");
            }
            marks.put(entry.getKey(), new Mark(Kind.byWord(mark.mark()).orElseThrow(), at, mark.note()));
        }
        return marks;
    }

    private static byte[] read(Path root, Path file) {
        if (!Files.exists(file)) {
            return null;
        }
        try {
            return Files.readAllBytes(file);
        } catch (IOException e) {
            throw new UserError(root.relativize(file) + ": cannot read (" + e.getMessage() + "); check its permissions");
        }
    }

    private String shown() {
        return Text.relative(projectRoot, file);
    }

}
