package dev.changeling.compile;

import dev.changeling.mutant.HostKind;
import dev.changeling.mutant.Point;
import dev.changeling.source.SourceFile;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * One file's schema text, and where in that text each switched host and each of its branches lies,
 * so that javac's error offsets can be traced back to points.
 *
 * @param source   the original file
 * @param text     the schema text
 * @param hosts    every switched host, outer hosts before the hosts nested in them
 * @param rejected points that could not be switched, each with the reason
 */
record RenderedFile(SourceFile source, String text, List<HostRegion> hosts, Map<Point, String> rejected) {

    /** One switched host: its extent in the schema text, its mutated branches and its original branch. */
    record HostRegion(List<Point> points, HostKind kind, int begin, int end, List<Branch> mutated, Branch original) {

        boolean contains(int offset) {
            return begin <= offset && offset < end;
        }

        boolean within(int from, int to) {
            return from <= begin && end <= to;
        }
    }

    /** One branch: the text of one point's change ({@code point} set), or the original with its inner hosts switched. */
    record Branch(Point point, int begin, int end) {

        boolean contains(int offset) {
            return begin <= offset && offset < end;
        }
    }

    String path() {
        return source.path();
    }

    /** The innermost host whose extent holds the offset, or null. */
    HostRegion innermostHostAt(int offset) {
        HostRegion found = null;
        for (HostRegion host : hosts) {
            if (host.contains(offset) && (found == null || host.end - host.begin < found.end - found.begin)) {
                found = host;
            }
        }
        return found;
    }

    /** The mutated branch that holds the offset, or null; mutated branches hold no inner hosts, so the innermost host decides. */
    Branch mutatedBranchAt(int offset) {
        HostRegion host = innermostHostAt(offset);
        if (host == null) {
            return null;
        }
        return host.mutated.stream().filter(branch -> branch.contains(offset)).findFirst().orElse(null);
    }

    /** The points of every host lying wholly inside {@code [from, to)}. */
    List<Point> pointsWithin(int from, int to) {
        List<Point> found = new ArrayList<>();
        for (HostRegion host : hosts) {
            if (host.within(from, to)) {
                found.addAll(host.points);
            }
        }
        return found;
    }

    List<Point> points() {
        return pointsWithin(0, text.length());
    }
}
