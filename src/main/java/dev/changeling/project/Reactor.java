package dev.changeling.project;

import dev.changeling.Text;
import dev.changeling.UserError;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

/**
 * The outermost aggregator pom above a module, found by walking up while each parent folder's pom lists the
 * folder below it as a module; from there mvn can build the module together with the modules it needs.
 *
 * @param root       the folder of the outermost aggregator
 * @param modulePath the module's folder relative to the root, as {@code -pl} takes it
 */
record Reactor(Path root, String modulePath) {

    static Optional<Reactor> around(Path module) {
        Path child = module.toAbsolutePath().normalize();
        Path outermost = null;
        for (Path parent = child.getParent(); parent != null; parent = parent.getParent()) {
            Path pom = parent.resolve("pom.xml");
            if (!Files.isRegularFile(pom) || !listsModule(pom, child)) {
                break;
            }
            outermost = parent;
            child = parent;
        }
        if (outermost == null) {
            return Optional.empty();
        }
        String relative = Text.relative(outermost, module.toAbsolutePath().normalize());
        return Optional.of(new Reactor(outermost, relative));
    }

    private static boolean listsModule(Path pom, Path folder) {
        try {
            return PomFile.read(pom).moduleFolders().contains(folder);
        } catch (UserError unreadable) {
            return false;
        }
    }
}
