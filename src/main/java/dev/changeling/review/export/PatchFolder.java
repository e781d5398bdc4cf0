package dev.changeling.review.export;

import dev.changeling.AtomicFiles;
import dev.changeling.results.MutantResult;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Pattern;
import java.util.stream.Stream;

/**
 * Writes one {@code <short id>.patch} per unresolved survivor into a folder: the unified diff stored
 * for it, byte for byte, which {@code git apply} accepts on an unmodified checkout.
 *
 * <p>Patches left in the folder by an earlier export (named like ours and holding a diff) whose
 * survivor is gone are removed, so the folder always shows the current survivors; any other file
 * is left alone.
 */
public final class PatchFolder {

    private static final Pattern OUR_NAME = Pattern.compile("[0-9a-f]{8,64}\\.patch");

    private PatchFolder() {
    }

    /**
     * @param toLookAt the survivors to look at ({@link dev.changeling.review.Standing#toLookAt()})
     * @return the patches written, in survivor order
     */
    public static List<Path> write(Path folder, List<MutantResult> toLookAt) throws IOException {
        List<MutantResult> survivors = toLookAt.stream()
                .filter(survivor -> survivor.diff() != null && !survivor.diff().isEmpty())
                .toList();
        Files.createDirectories(folder);
        Map<String, String> names = names(survivors);
        List<Path> written = new ArrayList<>();
        for (MutantResult survivor : survivors) {
            Path patch = folder.resolve(names.get(survivor.id()));
            AtomicFiles.write(patch, out -> out.write(survivor.diff().getBytes(StandardCharsets.UTF_8)));
            written.add(patch);
        }
        removeStale(folder, new HashSet<>(written));
        return written;
    }

    /** The short id, or the full id where two survivors share a short one. */
    static Map<String, String> names(List<MutantResult> survivors) {
        Map<String, Integer> shortIds = new HashMap<>();
        survivors.forEach(survivor -> shortIds.merge(survivor.shortId(), 1, Integer::sum));
        Map<String, String> names = new HashMap<>();
        for (MutantResult survivor : survivors) {
            String stem = shortIds.get(survivor.shortId()) > 1 ? survivor.id() : survivor.shortId();
            names.put(survivor.id(), stem + ".patch");
        }
        return names;
    }

    private static void removeStale(Path folder, Set<Path> current) throws IOException {
        List<Path> stale;
        try (Stream<Path> files = Files.list(folder)) {
            stale = files.filter(file -> OUR_NAME.matcher(file.getFileName().toString()).matches())
                    .filter(file -> !current.contains(file))
                    .filter(Files::isRegularFile)
                    .filter(PatchFolder::holdsOurDiff)
                    .toList();
        }
        for (Path file : stale) {
            Files.deleteIfExists(file);
        }
    }

    private static boolean holdsOurDiff(Path file) {
        try (var reader = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            String first = reader.readLine();
            String second = reader.readLine();
            return first != null && second != null && first.startsWith("--- a/") && second.startsWith("+++ b/");
        } catch (IOException e) {
            return false;
        }
    }
}
