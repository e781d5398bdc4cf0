package dev.changeling.mutant;

import java.util.Comparator;
import java.util.List;

/**
 * A fault to run the tests against: one point (first-order) or several points at distinct,
 * non-overlapping hosts of one file (k-order).
 */
public record Mutant(String fingerprint, List<Point> points) {

    public static final int SHORT_ID_LENGTH = 8;

    public Mutant {
        if (points.isEmpty()) {
            throw new IllegalArgumentException("a mutant needs at least one point");
        }
        points = List.copyOf(points);
    }

    public static Mutant firstOrder(Point point) {
        return new Mutant(point.fingerprint(), List.of(point));
    }

    public static Mutant ofPoints(List<Point> points) {
        List<Point> ordered = points.stream().sorted(Comparator.comparing(p -> p.edit())).toList();
        return ordered.size() == 1
                ? firstOrder(ordered.get(0))
                : new Mutant(Fingerprint.ofCombination(ordered), ordered);
    }

    public int order() {
        return points.size();
    }

    public String shortId() {
        return fingerprint.substring(0, SHORT_ID_LENGTH);
    }

    public String file() {
        return points.get(0).file();
    }

    public Point first() {
        return points.get(0);
    }

    /** The file's text with every point applied. */
    public String apply(String fileText) {
        StringBuilder out = new StringBuilder(fileText);
        for (int i = points.size() - 1; i >= 0; i--) {
            Point point = points.get(i);
            out.replace(point.edit().begin(), point.edit().end(), point.replacement());
        }
        return out.toString();
    }

    public boolean oncePerJvm() {
        return points.stream().anyMatch(Point::oncePerJvm);
    }
}
