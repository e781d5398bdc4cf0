package dev.changeling.analysis;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.Comparator;
import java.util.List;
import java.util.PriorityQueue;

/**
 * A small set of tests that kills every mutant the whole suite kills, chosen greedily: again and again the test that
 * kills the most mutants not yet killed, ties going to the smaller unique id. Greedy set cover is not guaranteed
 * minimal (it can take more tests than the fewest possible), but its choice is fixed by the matrix alone.
 */
public final class GreedyCover {

    /**
     * One chosen test.
     *
     * @param test  the row in the matrix
     * @param added mutants it killed that the tests chosen before it had not
     */
    public record Pick(int test, int added) {
    }

    private final List<Pick> picks;
    private final int suite;
    private final int killed;

    private GreedyCover(List<Pick> picks, int suite, int killed) {
        this.picks = List.copyOf(picks);
        this.suite = suite;
        this.killed = killed;
    }

    private record Candidate(int test, int gain) {
    }

    public static GreedyCover of(KillMatrix matrix) {
        BitSet left = matrix.killed();
        int killed = left.cardinality();
        Comparator<Candidate> best = Comparator.comparingInt(Candidate::gain).reversed()
                .thenComparing(candidate -> matrix.tests().get(candidate.test()));
        // A test's gain only shrinks as others are chosen, so a stale gain is an upper bound: a candidate whose fresh
        // gain still beats the best stale one is the greedy choice (the lazy form of the same greedy rule).
        PriorityQueue<Candidate> queue = new PriorityQueue<>(best);
        for (int test = 0; test < matrix.tests().size(); test++) {
            int gain = matrix.killsOf(test).cardinality();
            if (gain > 0) {
                queue.add(new Candidate(test, gain));
            }
        }
        List<Pick> picks = new ArrayList<>();
        while (!left.isEmpty() && !queue.isEmpty()) {
            Candidate top = queue.poll();
            BitSet gained = (BitSet) matrix.killsOf(top.test()).clone();
            gained.and(left);
            Candidate fresh = new Candidate(top.test(), gained.cardinality());
            if (fresh.gain() == 0) {
                continue;
            }
            if (queue.isEmpty() || best.compare(fresh, queue.peek()) <= 0) {
                picks.add(new Pick(fresh.test(), fresh.gain()));
                left.andNot(gained);
            } else {
                queue.add(fresh);
            }
        }
        return new GreedyCover(picks, matrix.tests().size(), killed);
    }

    /** The chosen tests in the order chosen. */
    public List<Pick> picks() {
        return picks;
    }

    /** How many tests the suite has (every row of the matrix). */
    public int suite() {
        return suite;
    }

    /** How many mutants the suite kills, all of which the chosen tests kill too. */
    public int killed() {
        return killed;
    }

    /** The chosen tests over the suite; 0 for an empty suite. */
    public double share() {
        return suite == 0 ? 0 : (double) picks.size() / suite;
    }
}
