package dev.changeling.project;

import java.util.List;

/**
 * One module of a run, compiled and ready to mutate and test with its own tests; a project of one module is its only
 * module.
 *
 * @param path         the module's folder relative to the build's root ({@code --module} takes it); empty for a
 *                     project of one module
 * @param project      the module compiled, its paths relative to the build's root
 * @param testedAlsoBy the other modules of the run whose tests have this module's classes on their classpath (they
 *                     depend on it, directly or through another module), in the reactor's order
 */
public record DiscoveredModule(String path, DiscoveredProject project, List<String> testedAlsoBy) {

    public DiscoveredModule {
        testedAlsoBy = List.copyOf(testedAlsoBy);
    }
}
