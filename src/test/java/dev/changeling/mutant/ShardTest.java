package dev.changeling.mutant;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;
import java.util.function.Function;
import java.util.stream.Collectors;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class ShardTest {

    /** Fingerprints as a run makes them, of made-up points of a lighthouse's lamp. */
    private static final List<String> FINGERPRINTS = IntStream.range(0, 3000)
            .mapToObj(i -> Fingerprint.of("src/main/java/coast/Lamp.java", "Lamp", "flash(int)", "relational-subset",
                    "beats > " + i, "beats >= " + i, i % 4))
            .toList();

    @Nested
    class TheShare {

        @ParameterizedTest(name = "N = {0}")
        @ValueSource(ints = {1, 2, 3, 5, 8})
        void holdsEachMutantInExactlyOneShard(int count) {
            for (String fingerprint : FINGERPRINTS) {
                long holding = IntStream.rangeClosed(1, count).filter(index -> new Shard(index, count).holds(fingerprint)).count();
                assertEquals(1, holding, fingerprint);
            }
        }

        @Test
        void theShardsTogetherAreTheWhole_inTheWholesOrder() {
            List<String> joined = new ArrayList<>();
            for (int index = 1; index <= 3; index++) {
                joined.addAll(new Shard(index, 3).of(FINGERPRINTS, Function.identity()));
            }
            assertEquals(new HashSet<>(FINGERPRINTS), new HashSet<>(joined));
            assertEquals(FINGERPRINTS.size(), joined.size());
            List<String> second = new Shard(2, 3).of(FINGERPRINTS, Function.identity());
            assertEquals(FINGERPRINTS.stream().filter(second::contains).toList(), second, "a shard keeps the order it is given");
        }

        @Test
        void dependsOnTheFingerprintAlone_notOnTheOrderOrTheOthers() {
            List<String> shuffled = new ArrayList<>(FINGERPRINTS);
            Collections.shuffle(shuffled, new Random(11));
            Shard shard = new Shard(2, 3);
            Set<String> inOrder = new HashSet<>(shard.of(FINGERPRINTS, Function.identity()));
            assertEquals(inOrder, new HashSet<>(shard.of(shuffled, Function.identity())));
            assertEquals(inOrder.stream().filter(FINGERPRINTS.subList(0, 100)::contains).collect(Collectors.toSet()),
                    new HashSet<>(shard.of(FINGERPRINTS.subList(0, 100), Function.identity())), "a smaller selection, the same answer");
        }

        /**
         * The rule as docs/results-format.md states it, worked by hand for one fingerprint of the harbour sample:
         * 0965f21032c3d20 (hexadecimal) = 42,325,841,898,388,768 (decimal); mod 3 = 1, so shard 2; mod 7 = 6, so shard 7.
         */
        @Test
        void isTheDocumentedRule_soEveryMachineAndEveryVersionAgree() {
            String fingerprint = "0965f21032c3d203a2f80eab74fb6e19563bd980223c129d4d5a7005b744892e";
            assertEquals(42_325_841_898_388_768L, Long.parseLong(fingerprint.substring(0, 15), 16));
            assertTrue(new Shard(2, 3).holds(fingerprint));
            assertTrue(new Shard(7, 7).holds(fingerprint));
            assertTrue(new Shard(1, 1).holds(fingerprint));
        }

        /** Within 10% of an even split over 3,000 fingerprints: common practice, no source. */
        @Test
        void sharesOutEvenly() {
            for (int index = 1; index <= 3; index++) {
                int size = new Shard(index, 3).of(FINGERPRINTS, Function.identity()).size();
                assertTrue(Math.abs(size - 1000) <= 100, "shard " + index + " holds " + size);
            }
        }
    }

    @Nested
    class AsTyped {

        @Test
        void readsIOfN() {
            assertEquals(new Shard(2, 3), Shard.parse("2/3"));
            assertEquals(new Shard(1, 1), Shard.parse(" 1 / 1 "));
            assertEquals("2/3", new Shard(2, 3).toString());
        }

        @ParameterizedTest(name = "{0}")
        @ValueSource(strings = {"0/3", "4/3", "-1/3", "1/0", "x", "2", "2/3/4", "a/b", "/3", ""})
        void refusesWhatIsNotAShard_sayingWhy(String typed) {
            IllegalArgumentException refused = assertThrows(IllegalArgumentException.class, () -> Shard.parse(typed));
            assertTrue(refused.getMessage().matches("(I|N|it)\\b.*"), refused.getMessage());
        }
    }
}
