package dev.changeling.cli;

import dev.changeling.UserError;
import dev.changeling.scope.ChangeScope;
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

    Optional<ChangeScope> scope(Path projectRoot) {
        int given = (since != null ? 1 : 0) + (uncommitted ? 1 : 0) + (diffFile != null ? 1 : 0);
        if (given > 1) {
            throw new UserError("--changed-since, --uncommitted and --diff-file each name the change; give one of them");
        }
        if (since != null) {
            return Optional.of(ChangeScope.sinceRevision(projectRoot, since));
        }
        if (uncommitted) {
            return Optional.of(ChangeScope.uncommitted(projectRoot));
        }
        return diffFile == null ? Optional.empty() : Optional.of(ChangeScope.fromDiffFile(projectRoot, diffFile));
    }
}
