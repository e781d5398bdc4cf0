package dev.changeling.review;

import java.util.List;

/**
 * How the equivalents list compares with one run.
 *
 * @param stale     entries whose mutant the run did not make although it covered their file and
 *                  operators, or whose file is gone: the code they judged has changed
 * @param unchecked entries the run could not judge (their file or operator was not part of it)
 */
public record Staleness(List<EquivalentEntry> stale, List<EquivalentEntry> unchecked) {

    public Staleness {
        stale = List.copyOf(stale);
        unchecked = List.copyOf(unchecked);
    }
}
