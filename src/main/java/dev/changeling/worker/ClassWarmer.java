package dev.changeling.worker;

import java.util.ArrayList;
import java.util.List;

/**
 * Initialises production classes once with no mutant switched on, so that their static state is built
 * from the original code and not under whichever mutant happens to run first.
 */
final class ClassWarmer {

    private ClassWarmer() {
    }

    /** Initialises each class; returns one line per class that could not be initialised. */
    static List<String> initialise(List<String> classNames) {
        ClassLoader loader = ClassLoader.getSystemClassLoader();
        List<String> failures = new ArrayList<>();
        for (String name : classNames) {
            try {
                Class.forName(name, true, loader);
            } catch (Throwable e) {
                failures.add(name + ": " + Failures.describe(e instanceof ExceptionInInitializerError && e.getCause() != null ? e.getCause() : e));
            }
        }
        return failures;
    }
}
