package dev.changeling.results;

import dev.changeling.Text;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import dev.changeling.AtomicFiles;
import dev.changeling.UserError;
import java.util.Objects;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
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
            return JSON.readerFor(RunResults.class).withAttribute(TestRefs.SUITE, suite).readValue(tree);
        } catch (IOException e) {
            throw new UserError(file + ": cannot read the results (" + Text.firstLine(Objects.requireNonNullElse(e.getMessage(), "unreadable"))
                    + "); run 'changeling run' again to rewrite it");
        }
    }

}
