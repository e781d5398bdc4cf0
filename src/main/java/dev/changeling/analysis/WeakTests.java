package dev.changeling.analysis;

import dev.changeling.results.MutantResult;
import dev.changeling.results.PointRecord;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Tests that run a method yet kill none of its mutants: for each method (the type and member of a mutant's first
 * point), the tests that reach any of its mutants minus those that kill any of them. Such a test executes the code
 * without checking what it does.
 */
public final class WeakTests {

    /**
     * One method and its weak tests.
     *
     * @param file    project-relative path
     * @param type    the enclosing type
     * @param member  the member signature
     * @param mutants the method's mutants in the matrix
     * @param reach   tests that reach at least one of them
     * @param weak    rows of the tests that reach but kill none of them, ascending
     */
    public record Method(String file, String type, String member, int mutants, int reach, List<Integer> weak) {

        public Method {
            weak = List.copyOf(weak);
        }
    }

    private record Key(String file, String type, String member) {
    }

    private WeakTests() {
    }

    /** Every method with at least one weak test, most weak tests first, then by file, type and member. */
    public static List<Method> of(KillMatrix matrix) {
        Map<Key, List<Integer>> byMethod = new LinkedHashMap<>();
        for (int column = 0; column < matrix.mutants().size(); column++) {
            MutantResult mutant = matrix.mutants().get(column);
            PointRecord first = mutant.first();
            byMethod.computeIfAbsent(new Key(mutant.file(), first.type(), first.member()), unused -> new ArrayList<>()).add(column);
        }
        List<Method> methods = new ArrayList<>();
        byMethod.forEach((key, columns) -> {
            BitSet reach = new BitSet();
            BitSet kill = new BitSet();
            for (int column : columns) {
                reach.or(matrix.reachOf(column));
                kill.or(matrix.killersOf(column));
            }
            BitSet weak = (BitSet) reach.clone();
            weak.andNot(kill);
            if (!weak.isEmpty()) {
                methods.add(new Method(key.file(), key.type(), key.member(), columns.size(), reach.cardinality(),
                        weak.stream().boxed().toList()));
            }
        });
        methods.sort(Comparator.comparingInt((Method method) -> method.weak().size()).reversed()
                .thenComparing(Method::file).thenComparing(Method::type).thenComparing(Method::member));
        return List.copyOf(methods);
    }
}
