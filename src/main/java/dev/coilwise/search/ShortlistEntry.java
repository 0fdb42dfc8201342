package dev.coilwise.search;

import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.scatter.ScatterSummary;
import java.util.Optional;

/**
 * One design of the shortlist.
 *
 * @param rank      1-based rank
 * @param candidate the design and its family
 * @param scatter   Monte Carlo over the manufacturing tolerances, when computed
 */
public record ShortlistEntry(int rank, Candidate candidate, Optional<ScatterSummary> scatter) {
    public Evaluation evaluation() {
        return candidate.evaluation();
    }

    public ShortlistEntry withRank(int r) {
        return new ShortlistEntry(r, candidate, scatter);
    }
}
