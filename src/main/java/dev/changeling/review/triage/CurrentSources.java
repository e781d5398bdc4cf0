package dev.changeling.review.triage;

import dev.changeling.source.SourceHash;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;

/**
 * The mutated files as they are on disk now, compared with the hashes the run recorded. Read afresh
 * each time, because the developer may be editing them while triaging.
 */
final class CurrentSources {

    enum State {
        /** The text is the one the run mutated. */
        UNCHANGED,
        /** The text differs from the one the run mutated. */
        CHANGED,
        /** The run recorded no hash for the file, so there is no telling. */
        UNKNOWN,
        /** The file is gone, or cannot be read. */
        GONE
    }

    /** A file now: its text (null when gone) and how it compares with the run. */
    record Current(String path, String text, State state) {
    }

    private final Path projectRoot;
    private final Map<String, String> hashesAtRun;

    CurrentSources(Path projectRoot, Map<String, String> hashesAtRun) {
        this.projectRoot = projectRoot;
        this.hashesAtRun = hashesAtRun == null ? Map.of() : hashesAtRun;
    }

    Current of(String path) {
        Path file = projectRoot.resolve(path);
        String text;
        try {
            text = Files.isRegularFile(file) ? Files.readString(file, StandardCharsets.UTF_8) : null;
        } catch (IOException e) {
            text = null;
        }
        if (text == null) {
            return new Current(path, null, State.GONE);
        }
        String recorded = hashesAtRun.get(path);
        if (recorded == null) {
            return new Current(path, text, State.UNKNOWN);
        }
        return new Current(path, text, recorded.equals(SourceHash.sha256(text)) ? State.UNCHANGED : State.CHANGED);
    }
}
