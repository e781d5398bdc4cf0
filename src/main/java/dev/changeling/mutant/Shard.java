package dev.changeling.mutant;

import java.util.List;
import java.util.function.Function;

/**
 * One of {@code count} disjoint shares of the mutants, decided by each mutant's fingerprint alone, so that as many
 * jobs on as many machines split one run and together run each mutant exactly once.
 *
 * <p>A mutant belongs to shard {@code index} when the number its fingerprint's first {@value #DIGITS} hexadecimal
 * digits make, modulo {@code count}, is {@code index - 1}: the same answer on every machine, whatever the order or the
 * number of the other mutants.
 *
 * @param index 1-based, from 1 to {@code count}
 * @param count how many shares the mutants are cut into
 */
public record Shard(int index, int count) {

    /** How a shard is written on the command line and in messages. */
    public static final String FORM = "I/N";

    /** Hexadecimal digits of the fingerprint read as a number: 60 bits, a positive {@code long}. */
    static final int DIGITS = 15;

    /** @throws IllegalArgumentException when {@code index} is not from 1 to {@code count} */
    public Shard {
        if (count < 1) {
            throw new IllegalArgumentException("N, the number of shards, must be at least 1");
        }
        if (index < 1 || index > count) {
            throw new IllegalArgumentException("I, the shard, must be from 1 to " + count);
        }
    }

    /**
     * The shard {@code text} names, such as {@code 2/3}.
     *
     * @throws IllegalArgumentException saying what is wrong with it
     */
    public static Shard parse(String text) {
        String[] parts = text.strip().split("/", -1);
        if (parts.length != 2) {
            throw new IllegalArgumentException("it is not of the form " + FORM);
        }
        try {
            return new Shard(Integer.parseInt(parts[0].strip()), Integer.parseInt(parts[1].strip()));
        } catch (NumberFormatException notANumber) {
            throw new IllegalArgumentException("I and N must be whole numbers");
        }
    }

    /** Whether the mutant of this fingerprint (hexadecimal, as {@link Fingerprint} makes it) is in this shard. */
    public boolean holds(String fingerprint) {
        return shareOf(fingerprint, count) == index - 1;
    }

    /** The items of this shard, in their order. */
    public <T> List<T> of(List<T> items, Function<T, String> fingerprint) {
        return items.stream().filter(item -> holds(fingerprint.apply(item))).toList();
    }

    /**
     * The 0-based share of {@code count} a fingerprint falls in.
     *
     * @throws IllegalArgumentException when it does not start with {@value #DIGITS} hexadecimal digits
     */
    static int shareOf(String fingerprint, int count) {
        if (fingerprint.length() < DIGITS) {
            throw new IllegalArgumentException("a fingerprint has at least " + DIGITS + " hexadecimal digits: " + fingerprint);
        }
        try {
            return (int) (Long.parseLong(fingerprint.substring(0, DIGITS), 16) % count);
        } catch (NumberFormatException notHex) {
            throw new IllegalArgumentException("a fingerprint is hexadecimal: " + fingerprint, notHex);
        }
    }

    @Override
    public String toString() {
        return index + "/" + count;
    }
}
