package dev.changeling.scope;

import dev.changeling.ExitCode;
import dev.changeling.UserError;
import java.nio.file.Path;
import java.util.Optional;

/**
 * The change as the user names it, before anything is read: since a git revision, the uncommitted work, or a
 * diff file. Resolved into the changed lines ({@link ChangeScope}) once the project's folder is known, so
 * reading the command line never runs git.
 *
 * @param sinceRevision the revision the change starts after, or null
 * @param uncommitted   whether the change is the working tree's uncommitted work
 * @param diffFile      a unified diff file holding the change, or null
 */
public record ChangeSpec(String sinceRevision, boolean uncommitted, Path diffFile) {

    /**
     * The change named by at most one of the three ways, or none when no way was used.
     *
     * @throws UserError (exit code 2) when more than one way names it
     */
    public static Optional<ChangeSpec> of(String sinceRevision, boolean uncommitted, Path diffFile) {
        int given = (sinceRevision != null ? 1 : 0) + (uncommitted ? 1 : 0) + (diffFile != null ? 1 : 0);
        if (given > 1) {
            throw new UserError("--changed-since, --uncommitted and --diff-file each name the change; give one of them",
                    ExitCode.USAGE);
        }
        return given == 0 ? Optional.empty() : Optional.of(new ChangeSpec(sinceRevision, uncommitted, diffFile));
    }

    /** The lines the change touches in the project: git or the diff file is read now. */
    public ChangeScope resolve(Path projectRoot) {
        if (sinceRevision != null) {
            return ChangeScope.sinceRevision(projectRoot, sinceRevision);
        }
        if (uncommitted) {
            return ChangeScope.uncommitted(projectRoot);
        }
        return ChangeScope.fromDiffFile(projectRoot, diffFile);
    }
}
