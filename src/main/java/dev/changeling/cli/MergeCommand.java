package dev.changeling.cli;

import dev.changeling.ExitCode;
import dev.changeling.UserError;
import dev.changeling.project.ProjectLayout;
import dev.changeling.results.ResultsFile;
import dev.changeling.results.RunResults;
import dev.changeling.results.ShardMerge;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** Puts the results files of the shards of one run back together into the results file of the whole run. */
@Command(name = "merge", mixinStandardHelpOptions = true,
        description = {
            "Put the results files of the N shards of one run ('changeling run --shard I/N', I from 1 to N) back together into"
                    + " the results of the whole run: the same mutants, verdicts and score as one run without --shard, which"
                    + " export, insights and triage then read. Each shard must be given once, all from runs with the same"
                    + " options on the same sources. See docs/ci-sharding.md."},
        exitCodeList = {
            "0:Merged.",
            "1:A mistake to fix: a results file that is missing or cannot be read, a file that cannot be written.",
            "7:The files are not the shards of one run: a shard is missing or given twice, or they were cut into other"
                    + " numbers of shards, or run with other options, sources or tests."},
        footerHeading = "%nExample:%n",
        footer = "  changeling merge shards/1/results.json shards/2/results.json shards/3/results.json")
final class MergeCommand implements Callable<Integer> {

    @Parameters(arity = "1..*", paramLabel = "SHARD_FILE", description = "The results file of each shard, in any order.")
    List<Path> shardFiles = new ArrayList<>();

    @Option(names = "--into", paramLabel = "FILE",
            description = "Where to write the merged results (default: results.json in the build folder's changeling/ of the"
                    + " project in the current folder, where export and insights read it).")
    Path into;

    @Mixin
    OutputOptions output = new OutputOptions();

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        List<ShardMerge.Part> parts = shardFiles.stream().map(file -> new ShardMerge.Part(file, ResultsFile.read(file))).toList();
        RunResults merged = ShardMerge.merge(parts);
        Path target = into != null ? into : ProjectLayout.locate(Path.of(""), Optional.empty()).resultsFile();
        try {
            ResultsFile.write(target, merged);
        } catch (IOException e) {
            throw new UserError(target + ": cannot write the merged results (" + e.getMessage() + "); give --into a file you can write");
        }
        PrintWriter out = spec.commandLine().getOut();
        out.println("merged " + parts.size() + (parts.size() == 1 ? " shard" : " shards") + " into " + target + ": "
                + merged.mutants().size() + (merged.mutants().size() == 1 ? " mutant" : " mutants")
                + (merged.complete() ? "" : "; a shard was interrupted, so the results are incomplete and a gate refuses them"));
        out.flush();
        return ExitCode.OK;
    }
}
