package dev.morse.matching;

import java.util.List;

/** How often one vector of critical cells per dimension occurred over repeated seeded trials. */
public record TrialCount(List<Integer> critical, int count) {
    /** Copies. */
    public TrialCount {
        critical = List.copyOf(critical);
        if (count < 1) {
            throw new IllegalArgumentException("a vector that occurred is counted at least once");
        }
    }
}
