package dev.coilwise.search;

import dev.coilwise.dynamics.SimulationResult;
import dev.coilwise.dynamics.SimulationSummary;
import dev.coilwise.dynamics.TimeHistory;
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
 * @param history    the simulation's time history, when it was kept (empty otherwise)
 */
public record ShortlistEntry(int rank, Candidate candidate, Optional<ScatterSummary> scatter,
                             Optional<SimulationSummary> simulation, TimeHistory history) {
    public ShortlistEntry {
        history = history == null ? TimeHistory.empty() : history;
    }

    public ShortlistEntry(int rank, Candidate candidate, Optional<ScatterSummary> scatter) {
        this(rank, candidate, scatter, Optional.empty(), TimeHistory.empty());
    }

    public ShortlistEntry(int rank, Candidate candidate, Optional<ScatterSummary> scatter,
                          Optional<SimulationSummary> simulation) {
        this(rank, candidate, scatter, simulation, TimeHistory.empty());
    }

    public Evaluation evaluation() {
        return candidate.evaluation();
    }

    public ShortlistEntry withRank(int r) {
        return new ShortlistEntry(r, candidate, scatter, simulation, history);
    }

    public ShortlistEntry withSimulation(SimulationSummary s) {
        return new ShortlistEntry(rank, candidate, scatter, Optional.of(s), TimeHistory.empty());
    }

    /** A copy with the simulation's summary and its time history (empty unless the simulation kept one). */
    public ShortlistEntry withSimulation(SimulationResult r) {
        return new ShortlistEntry(rank, candidate, scatter, Optional.of(r.summary()), r.history());
    }
}
