package dev.changeling.cli;

import dev.changeling.scope.ChangeSpec;
import java.nio.file.Path;
import java.util.Optional;
import picocli.CommandLine.Option;

/** Limits mutation to the lines a change touches: since a git revision, uncommitted work, or a diff file. */
final class ChangeOptions {

    @Option(names = "--changed-since", paramLabel = "REV",
            description = "Only lines changed since this git revision (a branch such as origin/main, a tag, a commit), working tree included.")
    String since;

    @Option(names = "--uncommitted", description = "Only lines changed in the working tree and not yet committed (untracked files included).")
    boolean uncommitted;

    @Option(names = "--diff-file", paramLabel = "FILE", description = "Only lines a unified diff file adds or changes (as review systems hand it over).")
    Path diffFile;

    /** The change as typed; the core reads git or the file once it knows the project. */
    Optional<ChangeSpec> spec() {
        return ChangeSpec.of(since, uncommitted, diffFile);
    }
}
