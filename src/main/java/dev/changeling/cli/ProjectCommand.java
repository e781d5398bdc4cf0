package dev.changeling.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** What every command that works on a project has: the project options (path, --plain, --verbose) and its streams. */
abstract class ProjectCommand implements Callable<Integer> {

    @Mixin
    ProjectOptions project = new ProjectOptions();

    @Spec
    CommandSpec spec;

    PrintWriter out() {
        return spec.commandLine().getOut();
    }

    PrintWriter err() {
        return spec.commandLine().getErr();
    }
}
