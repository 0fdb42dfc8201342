package dev.coilwise.search;

import dev.coilwise.dynamics.SimulationSummary;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.scatter.ScatterSummary;
import java.util.Optional;

/**
 * One design of the shortlist.
 *
 * @param rank       1-based rank
 * @param candidate  the design (custom or stock) and its family
 * @param scatter    Monte Carlo over the manufacturing tolerances, when computed
 * @param simulation time-domain check with a spring that has mass, when computed
 */
public record ShortlistEntry(int rank, Candidate candidate, Optional<ScatterSummary> scatter,
                             Optional<SimulationSummary> simulation) {
    public ShortlistEntry(int rank, Candidate candidate, Optional<ScatterSummary> scatter) {
        this(rank, candidate, scatter, Optional.empty());
    }

    public Evaluation evaluation() {
        return candidate.evaluation();
    }

    public ShortlistEntry withRank(int r) {
        return new ShortlistEntry(r, candidate, scatter, simulation);
    }

    public ShortlistEntry withSimulation(SimulationSummary s) {
        return new ShortlistEntry(rank, candidate, scatter, Optional.of(s));
    }
}
