package dev.changeling.run;

import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Debian's {@code chromium} in headless mode, for tests that look at a page as a browser draws it: a screenshot with
 * the browser's log, or the DOM after loading. Each call starts a browser with its own fresh profile folder.
 */
final class HeadlessChromium {

    private static final String EXECUTABLE = "chromium";
    private static final long LIMIT_SECONDS = 120;

    private final Path executable;
    private final Path profiles;

    private HeadlessChromium(Path executable, Path profiles) {
        this.executable = executable;
        this.profiles = profiles;
    }

    /** The browser on the PATH, if there is one; {@code profiles} holds the profile folder of each call. */
    static Optional<HeadlessChromium> find(Path profiles) {
        String path = System.getenv().getOrDefault("PATH", "");
        for (String folder : path.split(File.pathSeparator)) {
            Path candidate = Path.of(folder.isEmpty() ? "." : folder, EXECUTABLE);
            if (Files.isRegularFile(candidate) && Files.isExecutable(candidate)) {
                return Optional.of(new HeadlessChromium(candidate, profiles));
            }
        }
        return Optional.empty();
    }

    /** Draws {@code page} in a 1200×1600 window into {@code png}; the ending holds the browser's log. */
    ExternalCommand.Ended screenshot(Path page, Path png) {
        return run(page, "--enable-logging=stderr", "--v=0", "--screenshot=" + png, "--window-size=1200,1600");
    }

    /** The page's DOM after loading, as the browser serialises it (with whatever the browser logged mixed in). */
    ExternalCommand.Ended dumpDom(Path page) {
        return run(page, "--dump-dom");
    }

    private ExternalCommand.Ended run(Path page, String... options) {
        List<String> command = new ArrayList<>(List.of(executable.toString(), "--headless",
                // Chromium refuses to start its sandbox as root, as CI containers run; the page is our own.
                "--no-sandbox", "--disable-gpu", "--disable-dev-shm-usage", "--no-first-run",
                "--user-data-dir=" + profiles.resolve("profile-" + System.nanoTime())));
        command.addAll(List.of(options));
        command.add(page.toUri().toString());
        return ExternalCommand.run(page.getParent(), Map.of(), LIMIT_SECONDS, command);
    }
}
