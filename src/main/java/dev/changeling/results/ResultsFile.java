package dev.changeling.results;

import dev.changeling.Text;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.io.JsonEOFException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonMappingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import dev.changeling.AtomicFiles;
import dev.changeling.UserError;
import java.util.Objects;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/** Reads and writes the results file; writes are atomic (a temporary file, then a rename). */
public final class ResultsFile {

    /** Where a project's results live, below its build directory. */

    private static final ObjectMapper JSON = new ObjectMapper()
            .enable(SerializationFeature.INDENT_OUTPUT)
            .disable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES);

    private ResultsFile() {
    }

    public static void write(Path file, RunResults results) throws IOException {
        Map<String, Integer> index = new HashMap<>();
        List<TestRecord> tests = results.tests() == null ? List.of() : results.tests();
        for (int i = 0; i < tests.size(); i++) {
            index.putIfAbsent(tests.get(i).id(), i);
        }
        AtomicFiles.write(file, out -> JSON.writer().withAttribute(TestRefs.SUITE, index).writeValue(out, results));
    }

    /** When the results were written (the file's time), or the epoch when there are none. */
    public static Instant writtenAt(Path file) {
        try {
            return Files.getLastModifiedTime(file).toInstant();
        } catch (IOException missing) {
            return Instant.EPOCH;
        }
    }

    /**
     * The results in a file.
     *
     * @throws UserError (exit code 1) naming the file and what is wrong with it, when it is missing, of another
     *                   format, not JSON, or missing a part
     */
    public static RunResults read(Path file) {
        if (!Files.isRegularFile(file)) {
            throw new UserError(file + ": no results yet; run 'changeling run' in the project first");
        }
        try {
            JsonNode tree = JSON.readTree(file.toFile());
            int format = tree.path("format").asInt(-1);
            if (format != RunResults.FORMAT) {
                throw new UserError(file + ": results format " + format + " is not "
                        + RunResults.FORMAT + "; run 'changeling run' again to rewrite it");
            }
            List<String> suite = new ArrayList<>();
            tree.path("tests").forEach(test -> suite.add(test.path("id").asText(null)));
            RunResults results = JSON.readerFor(RunResults.class).withAttribute(TestRefs.SUITE, suite).readValue(tree);
            if (results.settings() == null || results.mutants() == null || results.tests() == null) {
                throw new UserError(file + ": not a whole results file (its settings, tests or mutants are missing);"
                        + " run 'changeling run' again to rewrite it");
            }
            return results;
        } catch (IOException e) {
            throw new UserError(file + ": cannot read the results (" + why(e) + "); run 'changeling run' again to rewrite it");
        }
    }

    /** What is wrong with a file Jackson could not read, in our words: where, and the parser's first words. */
    private static String why(IOException e) {
        if (e instanceof JsonEOFException) {
            return "it ends before its JSON does; it may have been cut off";
        }
        if (e instanceof JsonMappingException mapping && !mapping.getPath().isEmpty()) {
            StringBuilder field = new StringBuilder();
            for (JsonMappingException.Reference step : mapping.getPath()) {
                if (step.getFieldName() != null) {
                    field.append(field.length() == 0 ? "" : ".").append(step.getFieldName());
                } else {
                    field.append('[').append(step.getIndex()).append(']');
                }
            }
            String detail = Text.firstLine(mapping.getOriginalMessage());
            boolean ours = !detail.contains("`");
            return "its field " + field + " does not hold what a results file keeps there" + (ours ? ": " + detail : "");
        }
        if (e instanceof JsonProcessingException json && json.getLocation() != null && json.getLocation().getLineNr() > 0) {
            String first = Text.firstLine(json.getOriginalMessage());
            int cut = first.indexOf(" (");
            return "not JSON at line " + json.getLocation().getLineNr() + ", column " + json.getLocation().getColumnNr()
                    + ": " + (cut < 0 ? first : first.substring(0, cut));
        }
        return Text.firstLine(Objects.requireNonNullElse(e.getMessage(), "unreadable"));
    }
}
