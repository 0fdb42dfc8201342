package dev.coilwise.search;

import java.util.List;

/**
 * Outcome of a search over a {@link DesignSpace}.
 *
 * @param space       the space searched
 * @param best        the best feasible design of every family that has one, best first
 * @param evaluated   candidates fully evaluated by the mechanics core
 * @param feasibleSeen feasible candidates met among those evaluated (a pruned search meets fewer than exist)
 */
public record SearchResult(DesignSpace space, List<Candidate> best, long evaluated, long feasibleSeen) {
    public SearchResult {
        best = List.copyOf(best);
    }

    /** The first {@code n} designs. */
    public List<Candidate> top(int n) {
        return best.subList(0, Math.min(n, best.size()));
    }
}
