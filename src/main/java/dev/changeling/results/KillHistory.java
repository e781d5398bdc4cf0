package dev.changeling.results;

import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import dev.changeling.AtomicFiles;
import dev.changeling.Text;
import dev.changeling.UserError;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Collections;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

/**
 * How often each operator's first-order mutants were detected in the project's last full run (neither scoped to a
 * change nor sampled), kept beside the results file so that a run with a per-line budget keeps the points of the
 * operators most likely to be detected. Read as it is by every budgeted run until the next full run replaces it, so
 * the same tree always gives the same mutants. Documented in {@code docs/results-format.md}.
 *
 * @param format    the version of this layout
 * @param operators by operator id: its first-order mutants counted in the score, and how many of them were detected
 */
public record KillHistory(int format, Map<String, Kills> operators) {

    public static final int FORMAT = 1;

    private static final ObjectMapper JSON = new ObjectMapper()
            .enable(SerializationFeature.INDENT_OUTPUT)
            .enable(SerializationFeature.ORDER_MAP_ENTRIES_BY_KEYS)
            .disable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES);

    /** One operator's figures: {@code counted} excludes stillborn and skipped mutants, as the score does. */
    public record Kills(int detected, int counted) {
    }

    public KillHistory {
        operators = operators == null ? Map.of() : Collections.unmodifiableMap(new TreeMap<>(operators));
    }

    /** The history a run leaves, when it is a complete full run; nothing for a run of a change, a sample, a shard or a partial run. */
    public static Optional<KillHistory> of(RunResults results) {
        RunSettings settings = results.settings();
        if (!results.complete() || settings.changeScope() != null || settings.sampled() || results.shard() != null) {
            return Optional.empty();
        }
        Map<String, Kills> operators = new TreeMap<>();
        results.mutants().stream()
                .filter(mutant -> mutant.order() == 1 && mutant.verdict().counted())
                .forEach(mutant -> operators.merge(mutant.first().operator(), new Kills(mutant.verdict().detected() ? 1 : 0, 1),
                        (a, b) -> new Kills(a.detected() + b.detected(), a.counted() + b.counted())));
        return Optional.of(new KillHistory(FORMAT, operators));
    }

    /** Each operator's share of detected mutants, by id; an operator none of whose mutants counted has none. */
    public Map<String, Double> ratios() {
        Map<String, Double> ratios = new TreeMap<>();
        operators.forEach((operator, kills) -> {
            if (kills.counted() > 0) {
                ratios.put(operator, (double) kills.detected() / kills.counted());
            }
        });
        return ratios;
    }

    public void write(Path file) throws IOException {
        AtomicFiles.write(file, out -> JSON.writeValue(out, this));
    }

    /**
     * The history in a file, or none when there is no file.
     *
     * @throws UserError (exit code 1) naming the file and what to do, when it cannot be read or is of another format
     */
    public static Optional<KillHistory> read(Path file) {
        if (!Files.isRegularFile(file)) {
            return Optional.empty();
        }
        KillHistory history;
        try {
            history = JSON.readValue(file.toFile(), KillHistory.class);
        } catch (IOException e) {
            throw unusable(file, "cannot read it (" + Text.firstLine(e.getMessage()) + ")");
        }
        if (history.format() != FORMAT) {
            throw unusable(file, "its format " + history.format() + " is not " + FORMAT);
        }
        return Optional.of(history);
    }

    private static UserError unusable(Path file, String what) {
        return new UserError(file + ": " + what + "; delete it, or run 'changeling run' on the whole project to write it again");
    }
}
