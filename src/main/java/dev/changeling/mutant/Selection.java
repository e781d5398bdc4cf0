package dev.changeling.mutant;

import dev.changeling.UserError;
import dev.changeling.project.ProjectLayout;
import dev.changeling.source.JavaSources;
import dev.changeling.source.SourceFile;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * The mutants a command works on: those of the project's main sources (or of the paths named), as
 * the request makes them, then sampled when a sample is asked for.
 *
 * @param request    which mutants to make
 * @param sampleSize how many to keep, or null for all
 * @param margin     alternatively, the ±margin at 95% the sample should give (Cochran), or null
 * @param sampleSeed the seed of the sample
 * @param mix        alternatively, a sample of first-order and k-order mutants with the parts of the latter, or null
 */
public record Selection(MutantRequest request, Integer sampleSize, Double margin, long sampleSeed, MixedSample mix) {

    /** A selection of every mutant the request makes. */
    public static Selection all(MutantRequest request, long seed) {
        return new Selection(request, null, null, seed, null);
    }

    /** The chosen mutants, the population they were drawn from, and the generation they came from. */
    public record Chosen(List<Mutant> mutants, int population, boolean sampled, Generation.Generated generated) {

        /** Only the mutants of one shard, chosen after sampling so that the shards together are the whole choice. */
        public Chosen inShard(Shard shard) {
            return new Chosen(shard.of(mutants, Mutant::fingerprint), population, sampled, generated);
        }
    }

    /** The same selection, leaving out the points the project's suppression rules name. */
    public Selection withSuppressions(Suppressions rules) {
        return new Selection(request.withSuppressions(rules), sampleSize, margin, sampleSeed, mix);
    }

    /** The same selection, its per-line budget ranking operators by these kill ratios (operator id to ratio). */
    public Selection rankedBy(Map<String, Double> killRatios) {
        return new Selection(request.withBudget(request.budget().rankedBy(killRatios)), sampleSize, margin, sampleSeed, mix);
    }

    /** The same selection, keeping only the points {@code filter} also keeps (e.g. those on changed lines). */
    public Selection narrowedTo(java.util.function.Predicate<Point> filter) {
        return new Selection(request.narrowedTo(filter), sampleSize, margin, sampleSeed, mix);
    }

    public Chosen choose(ProjectLayout layout, List<Path> only) {
        return choose(layout, only, Optional.empty());
    }

    /**
     * The mutants of the main sources (of the paths named), reading and parsing only the files {@code within} names
     * (project-relative) when it is given: a change's files, whose lines alone can hold its points.
     */
    public Chosen choose(ProjectLayout layout, List<Path> only, Optional<Set<String>> within) {
        Generation.Generated generated = Generation.generate(read(layout, only, within), request);
        List<Mutant> all = generated.mutants();
        if (mix != null) {
            List<Mutant> picked = mix.pick(all, sampleSeed);
            return new Chosen(picked, all.size(), picked.size() < all.size(), generated);
        }
        Integer size = sampleSize;
        if (size == null && margin != null) {
            size = Sampling.sizeForMargin(margin, 0.5, all.size());
        }
        if (size == null || size >= all.size()) {
            return new Chosen(all, all.size(), false, generated);
        }
        return new Chosen(Sampling.pick(all, size, sampleSeed), all.size(), true, generated);
    }

    /** One line on what the per-line budget left out of {@code chosen} and what ranked the points; none without a budget. */
    public Optional<String> budgetNote(Chosen chosen) {
        LineBudget budget = request.budget();
        return budget.limits()
                ? Optional.of(budget.describe(chosen.generated().notMade().getOrDefault(LineBudget.REASON, 0)))
                : Optional.empty();
    }

    /** One line on the two draws of a mixed sample and the parts added to them; none for other selections. */
    public Optional<String> mixNote(Chosen chosen) {
        return Optional.ofNullable(mix).map(sample -> sample.describe(chosen.mutants(), chosen.generated().mutants()));
    }

    private static List<SourceFile> read(ProjectLayout layout, List<Path> only, Optional<Set<String>> within) {
        List<SourceFile> files = new ArrayList<>();
        for (Path path : layout.mainSources()) {
            if (within.isPresent() && !within.get().contains(layout.root().relativize(path).toString().replace('\\', '/'))) {
                continue;
            }
            if (only.isEmpty() || only.stream().anyMatch(wanted -> path.startsWith(wanted.toAbsolutePath().normalize()))) {
                try {
                    files.add(JavaSources.read(layout.root(), path));
                } catch (IOException e) {
                    throw new UserError(layout.relative(path) + ": cannot read (" + e.getMessage() + ")");
                }
            }
        }
        for (Path wanted : only) {
            if (!Files.exists(wanted)) {
                throw new UserError(wanted + ": no such file or folder");
            }
        }
        return files;
    }
}
