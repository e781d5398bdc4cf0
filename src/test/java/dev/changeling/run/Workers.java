package dev.changeling.run;

import java.nio.file.Path;
import java.util.List;

/** Worker JVMs of one project still alive on this machine, found by their main class and the project's path. */
final class Workers {

    /** Worker JVMs run classes of this package; it is on their command line (the main class). */
    private static final String WORKER_PACKAGE = "dev.changeling.worker";

    private Workers() {
    }

    static List<String> aliveFor(Path project) {
        String path = project.toAbsolutePath().toString();
        return ProcessHandle.allProcesses()
                .filter(ProcessHandle::isAlive)
                .filter(process -> process.info().commandLine()
                        .map(line -> line.contains(WORKER_PACKAGE) && line.contains(path))
                        .orElse(false))
                .map(process -> process.pid() + ": " + process.info().commandLine().orElse("?"))
                .toList();
    }
}
