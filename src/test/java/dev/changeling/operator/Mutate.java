package dev.changeling.operator;

import dev.changeling.mutant.Mutant;
import dev.changeling.mutant.Point;
import dev.changeling.mutant.PointFinder;
import dev.changeling.mutant.Snippets;
import dev.changeling.source.JavaSources;
import dev.changeling.source.SourceFile;
import java.util.List;

/** Runs the real engine (parse, then PointFinder) on a source text, and shows points the way the catalogue writes them. */
final class Mutate {

    static final String PATH = "Example.java";

    private Mutate() {
    }

    static List<Point> points(String source, List<MutationOperator> operators) {
        JavaSources.Parsed parsed = JavaSources.parse(SourceFile.of(PATH, source));
        if (!parsed.ok()) {
            throw new AssertionError("the source does not parse: " + parsed.problem() + "\n" + source);
        }
        return new PointFinder(operators).find(parsed);
    }

    static List<Point> points(String source, MutationOperator... operators) {
        return points(source, List.of(operators));
    }

    /** {@code original => mutated}, white space normalised, with the catalogue's word for a removed statement. */
    static String line(String original, String mutated) {
        String after = Snippets.normalise(mutated);
        return Snippets.normalise(original) + " => " + (after.isEmpty() ? Catalogue.REMOVED : after);
    }

    static String line(Point point, String source) {
        return line(point.snippet(), point.mutatedHost(source));
    }

    static List<String> lines(String source, MutationOperator... operators) {
        return points(source, operators).stream().map(point -> line(point, source)).toList();
    }

    /** The whole file with the point applied. */
    static String applied(Point point, String source) {
        return Mutant.firstOrder(point).apply(source);
    }
}
