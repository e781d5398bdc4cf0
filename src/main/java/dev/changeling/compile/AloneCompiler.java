package dev.changeling.compile;

import dev.changeling.mutant.Mutant;
import dev.changeling.source.SourceFile;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Function;
import javax.tools.Diagnostic;
import javax.tools.JavaFileObject;

/**
 * Compiles mutants that cannot share the schema, each from its own mutated file into its own folder;
 * one that does not compile is stillborn. Mutants of different files share a javac task: a mutant
 * leaves every declaration as it was, so a file compiles the same beside another file's mutant as
 * beside that file's original.
 */
final class AloneCompiler {

    /** At most this many files per task, to bound the compiler's memory. */
    static final int BATCH = 64;

    /** One mutant to compile, and why it is not in the schema. */
    record Job(Mutant mutant, SourceFile file, Path classes, String reason) {
    }

    private final Javac javac;
    private int tasks;

    AloneCompiler(Javac javac) {
        this.javac = javac;
    }

    /** Where each mutant ended up, by fingerprint. */
    Map<String, Placement> compile(List<Job> jobs) {
        Map<String, Placement> placements = new LinkedHashMap<>();
        List<Job> pending = new ArrayList<>(jobs);
        while (!pending.isEmpty()) {
            List<Job> batch = onePerFile(pending, job -> job.file().path());
            pending.removeAll(batch);
            Map<String, Diagnostic<? extends JavaFileObject>> firstErrors = analyze(batch);
            List<Job> compiled = new ArrayList<>();
            for (Job job : batch) {
                Diagnostic<? extends JavaFileObject> error = firstErrors.get(job.file().path());
                if (error != null) {
                    placements.put(job.mutant().fingerprint(), Placement.stillborn(Javac.describe(error)));
                } else {
                    compiled.add(job);
                }
            }
            if (!firstErrors.isEmpty() && !compiled.isEmpty()) {
                // javac writes nothing once any file has an error, so the others are compiled again by themselves
                writeEach(compiled, placements);
                continue;
            }
            compiled.forEach(job -> placements.put(job.mutant().fingerprint(), Placement.alone(job.classes(), job.reason())));
        }
        return placements;
    }

    int tasks() {
        return tasks;
    }

    private void writeEach(List<Job> clean, Map<String, Placement> placements) {
        if (analyze(clean).isEmpty()) {
            clean.forEach(job -> placements.put(job.mutant().fingerprint(), Placement.alone(job.classes(), job.reason())));
            return;
        }
        for (Job job : clean) {
            Map<String, Diagnostic<? extends JavaFileObject>> errors = analyze(List.of(job));
            placements.put(job.mutant().fingerprint(), errors.isEmpty()
                    ? Placement.alone(job.classes(), job.reason())
                    : Placement.stillborn(Javac.describe(errors.values().iterator().next())));
        }
    }

    /** Compiles the batch, writing classes when every file compiles; the first error of each file that does not. */
    private Map<String, Diagnostic<? extends JavaFileObject>> analyze(List<Job> batch) {
        tasks++;
        Map<String, Path> outputs = new LinkedHashMap<>();
        List<Javac.Source> sources = new ArrayList<>();
        for (Job job : batch) {
            outputs.put(job.file().path(), job.classes());
            sources.add(new Javac.Source(job.file().path(), job.mutant().apply(job.file().text())));
        }
        Javac.Task task = javac.task(sources, outputs);
        task.analyze();
        Map<String, Diagnostic<? extends JavaFileObject>> firstErrors = new LinkedHashMap<>();
        for (Diagnostic<? extends JavaFileObject> error : task.errors()) {
            firstErrors.putIfAbsent(Javac.pathOf(error.getSource()), error);
        }
        if (firstErrors.isEmpty()) {
            task.generate();
        }
        return firstErrors;
    }

    /** At most {@link #BATCH} of the pending items, no two of one file, so that they can share a javac task. */
    static <T> List<T> onePerFile(List<T> pending, Function<T, String> fileOf) {
        List<T> batch = new ArrayList<>();
        Set<String> files = new HashSet<>();
        for (T item : pending) {
            if (batch.size() < BATCH && files.add(fileOf.apply(item))) {
                batch.add(item);
            }
        }
        return batch;
    }
}
