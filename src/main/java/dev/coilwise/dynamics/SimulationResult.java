package dev.coilwise.dynamics;

/**
 * Outcome of one simulation.
 *
 * @param summary the figures and warnings
 * @param history the time history, empty unless {@link SimulationOptions#keepHistory()}
 */
public record SimulationResult(SimulationSummary summary, TimeHistory history) {
    public SimulationResult {
        if (summary == null || history == null) {
            throw new IllegalArgumentException("a simulation result needs a summary and a (possibly empty) history");
        }
    }
}
