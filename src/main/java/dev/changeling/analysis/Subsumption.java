package dev.changeling.analysis;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

/**
 * Subsumption among the mutants of a kill matrix: mutant A subsumes B when A is killed and every test that kills A also
 * kills B. Mutants with the very same killers subsume each other and count as one group; a group is subsuming when no
 * other group's killers are a strict subset of its own. A mutant no test kills is subsumed by nothing and, having no
 * killers to compare, counts as a subsuming mutant of its own. The score over subsuming mutants is the killed subsuming
 * groups over all subsuming mutants: redundant mutants, which inflate the plain score, weigh nothing in it.
 *
 * @param killed       killed mutants
 * @param groups       groups of killed mutants with the same killers
 * @param subsuming    the groups no other group subsumes, each as the columns it holds (ascending)
 * @param undetected   mutants no test kills, each a subsuming mutant of its own
 */
public record Subsumption(int killed, int groups, List<List<Integer>> subsuming, int undetected) {

    public Subsumption {
        subsuming = subsuming.stream().map(List::copyOf).toList();
    }

    public static Subsumption of(KillMatrix matrix) {
        Map<BitSet, List<Integer>> byKillers = new LinkedHashMap<>();
        int undetected = 0;
        for (int column = 0; column < matrix.mutants().size(); column++) {
            BitSet killers = matrix.killersOf(column);
            if (killers.isEmpty()) {
                undetected++;
            } else {
                byKillers.computeIfAbsent(killers, unused -> new ArrayList<>()).add(column);
            }
        }
        List<BitSet> sets = new ArrayList<>(byKillers.keySet());
        sets.sort(Comparator.comparingInt(BitSet::cardinality));
        List<List<Integer>> subsuming = new ArrayList<>();
        for (int candidate = 0; candidate < sets.size(); candidate++) {
            BitSet own = sets.get(candidate);
            boolean subsumed = false;
            // Only a set with fewer killers can be a strict subset; the list is sorted by size.
            for (int other = 0; other < candidate && !subsumed; other++) {
                BitSet smaller = sets.get(other);
                subsumed = smaller.cardinality() < own.cardinality() && inside(smaller, own);
            }
            if (!subsumed) {
                subsuming.add(byKillers.get(own));
            }
        }
        subsuming.sort(Comparator.comparingInt(group -> group.get(0)));
        int killed = byKillers.values().stream().mapToInt(List::size).sum();
        return new Subsumption(killed, byKillers.size(), subsuming, undetected);
    }

    private static boolean inside(BitSet smaller, BitSet own) {
        for (int bit = smaller.nextSetBit(0); bit >= 0; bit = smaller.nextSetBit(bit + 1)) {
            if (!own.get(bit)) {
                return false;
            }
        }
        return true;
    }

    /** Subsuming mutants: the subsuming groups of killed mutants, and every undetected mutant. */
    public int subsumingMutants() {
        return subsuming.size() + undetected;
    }

    /** Killed subsuming groups over subsuming mutants; empty when there are none. */
    public OptionalDouble score() {
        int all = subsumingMutants();
        return all == 0 ? OptionalDouble.empty() : OptionalDouble.of((double) subsuming.size() / all);
    }
}
