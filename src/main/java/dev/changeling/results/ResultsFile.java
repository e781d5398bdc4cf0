package dev.changeling.results;

import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import dev.changeling.AtomicFiles;
import dev.changeling.UserError;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/** Reads and writes the results file; writes are atomic (a temporary file, then a rename). */
public final class ResultsFile {

    /** Where a project's results live, below its build directory. */
    public static final String RELATIVE_PATH = "target/changeling/results.json";

    private static final ObjectMapper JSON = new ObjectMapper()
            .enable(SerializationFeature.INDENT_OUTPUT)
            .disable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES);

    private ResultsFile() {
    }

    public static Path in(Path project) {
        return project.resolve(RELATIVE_PATH);
    }

    public static void write(Path file, RunResults results) throws IOException {
        AtomicFiles.write(file, out -> JSON.writeValue(out, results));
    }

    public static RunResults read(Path file) {
        if (!Files.isRegularFile(file)) {
            throw new UserError(file + ": no results yet; run 'changeling run' in the project first");
        }
        try {
            RunResults results = JSON.readValue(file.toFile(), RunResults.class);
            if (results.format() != RunResults.FORMAT) {
                throw new UserError(file + ": results format " + results.format() + " is not "
                        + RunResults.FORMAT + "; run 'changeling run' again to rewrite it");
            }
            return results;
        } catch (IOException e) {
            throw new UserError(file + ": cannot read the results (" + firstLine(e.getMessage())
                    + "); run 'changeling run' again to rewrite it");
        }
    }

    private static String firstLine(String message) {
        if (message == null) {
            return "unreadable";
        }
        int newline = message.indexOf('\n');
        return newline < 0 ? message : message.substring(0, newline);
    }
}
