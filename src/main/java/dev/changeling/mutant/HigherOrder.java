package dev.changeling.mutant;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.TreeMap;
import java.util.function.Function;

/**
 * Combines first-order points into k-order mutants: within each scope, the points are shuffled by a
 * seeded random order and packed greedily into groups of k whose hosts do not overlap. Each point
 * joins at most one group; the same seed always gives the same mutants.
 */
public final class HigherOrder {

    /** Where the k points of one mutant may come from. */
    public enum Scope {
        METHOD(point -> point.file() + "#" + point.type() + "#" + point.member()),
        CLASS(point -> point.file() + "#" + point.type()),
        FILE(Point::file);

        private final Function<Point, String> key;

        Scope(Function<Point, String> key) {
            this.key = key;
        }
    }

    public static final int MIN_ORDER = 2;
    public static final int MAX_ORDER = 5;

    private HigherOrder() {
    }

    public static List<Mutant> combine(List<Point> points, int order, Scope scope, long seed) {
        if (order < MIN_ORDER || order > MAX_ORDER) {
            throw new IllegalArgumentException("order must be from " + MIN_ORDER + " to " + MAX_ORDER + ", not " + order);
        }
        Map<String, List<Point>> groups = new TreeMap<>();
        for (Point point : points) {
            groups.computeIfAbsent(scope.key.apply(point), k -> new ArrayList<>()).add(point);
        }
        List<Mutant> mutants = new ArrayList<>();
        groups.forEach((key, members) -> mutants.addAll(pack(members, order, new Random(seed * 31 + stableHash(key)))));
        return mutants;
    }

    private static List<Mutant> pack(List<Point> members, int order, Random random) {
        List<Point> shuffled = new ArrayList<>(members);
        shuffled.sort(Comparator.comparing(Point::fingerprint));
        java.util.Collections.shuffle(shuffled, random);
        List<List<Point>> open = new ArrayList<>();
        List<Mutant> done = new ArrayList<>();
        for (Point point : shuffled) {
            List<Point> home = open.stream().filter(group -> fits(group, point)).findFirst().orElse(null);
            if (home == null) {
                home = new ArrayList<>();
                open.add(home);
            }
            home.add(point);
            if (home.size() == order) {
                open.remove(home);
                done.add(Mutant.ofPoints(home));
            }
        }
        return done;
    }

    private static boolean fits(List<Point> group, Point point) {
        return group.stream().noneMatch(member -> member.host().overlaps(point.host()));
    }

    private static long stableHash(String key) {
        long hash = 1125899906842597L;
        for (int i = 0; i < key.length(); i++) {
            hash = 31 * hash + key.charAt(i);
        }
        return hash;
    }
}
