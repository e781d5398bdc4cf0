package dev.changeling.results;

import java.util.List;

/**
 * Which share of a sharded run a results file holds ({@code run --shard I/N}), and the whole selection it was cut
 * from, so that merging the shards can check that they make one run and put the mutants back in the run's order.
 *
 * @param index     the shard, from 1 to {@code count}
 * @param count     how many shards the run was cut into
 * @param selection the fingerprint of every mutant of the whole run, in the order an unsharded run lists them
 */
public record ShardRecord(int index, int count, List<String> selection) {

    public ShardRecord {
        selection = selection == null ? List.of() : List.copyOf(selection);
    }

    /** How the shard is written in messages, such as {@code 2/3}. */
    public String label() {
        return index + "/" + count;
    }
}
