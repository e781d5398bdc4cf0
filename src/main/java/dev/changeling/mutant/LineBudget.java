package dev.changeling.mutant;

import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.IdentityHashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * At most so many points on each line of a change under review: a line's points are ranked ({@link PointRanking})
 * and the first {@code perLine} kept; the others are counted as not made, under {@link #REASON}. A point belongs to
 * the line its edit starts on. Mutants of every order are made from the points kept.
 *
 * @param perLine    how many points a line keeps; 0 keeps every one
 * @param killRatios each operator's share of detected mutants in the project's last full run, by id; empty when
 *                   none was recorded, and the catalogue's order decides
 */
public record LineBudget(int perLine, Map<String, Double> killRatios) {

    /** The reason the points a budget leaves out are counted under. */
    public static final String REASON = "over the per-line budget";

    /** What a run scoped to a change keeps on each changed line unless told otherwise. */
    public static final int DEFAULT_PER_LINE = 1;

    /** Every point kept. */
    public static final LineBudget NONE = new LineBudget(0, Map.of());

    public LineBudget {
        if (perLine < 0) {
            throw new IllegalArgumentException("a line cannot keep fewer than 0 points: " + perLine);
        }
        killRatios = Map.copyOf(killRatios);
    }

    public boolean limits() {
        return perLine > 0;
    }

    /** The same budget with the points ranked by these kill ratios. */
    public LineBudget rankedBy(Map<String, Double> ratios) {
        return new LineBudget(perLine, ratios);
    }

    /** The points kept, in their order; each one left out is counted in {@code notMade} under {@link #REASON}. */
    List<Point> keep(List<Point> points, Map<String, Integer> notMade) {
        if (!limits()) {
            return points;
        }
        Map<String, List<Point>> byLine = new LinkedHashMap<>();
        for (Point point : points) {
            byLine.computeIfAbsent(point.file() + ":" + point.line(), line -> new ArrayList<>()).add(point);
        }
        Comparator<Point> ranking = PointRanking.of(killRatios);
        Set<Point> kept = Collections.newSetFromMap(new IdentityHashMap<>());
        for (List<Point> line : byLine.values()) {
            line.sort(ranking);
            kept.addAll(line.subList(0, Math.min(perLine, line.size())));
            if (line.size() > perLine) {
                notMade.merge(REASON, line.size() - perLine, Integer::sum);
            }
        }
        return points.stream().filter(kept::contains).toList();
    }

    /** One line on what the budget did, for a run's phases and the listing: how many it left out, and what ranked them. */
    public String describe(int leftOut) {
        return "per-line budget: at most " + perLine + (perLine == 1 ? " mutant" : " mutants") + " on each changed line, "
                + leftOut + " left out (--per-line all makes every one); "
                + (killRatios.isEmpty()
                        ? "no full run has recorded kills yet, so operators rank in catalogue order"
                        : "operators rank by how often their mutants were detected in the last full run");
    }
}
