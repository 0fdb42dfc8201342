package dev.coilwise.search;

import dev.coilwise.dynamics.SimulationOptions;
import dev.coilwise.scatter.ScatterProgress;
import dev.coilwise.scatter.ScatterSettings;
import java.util.Optional;

/**
 * How much checking `size` does beyond the search.
 *
 * @param scatter    Monte Carlo settings, or empty to skip it (the robustness ranking and a minimum probability then
 *                   use the default settings anyway)
 * @param progress   told how far the Monte Carlo has got
 * @param simulation time-domain check of each shortlisted design, or empty to skip it (strict dynamics then uses the
 *                   default options anyway)
 */
public record SizingOptions(Optional<ScatterSettings> scatter, ScatterProgress progress,
                            Optional<SimulationOptions> simulation) {
    /** Pool of leading designs, as a multiple of the shortlist length, that robustness and strict dynamics draw from. */
    public static final int POOL = 3;

    public static SizingOptions defaults() {
        return new SizingOptions(Optional.of(ScatterSettings.defaults()), ScatterProgress.NONE,
                Optional.of(SimulationOptions.defaults()));
    }

    /** Search and shortlist only: no Monte Carlo, no simulation. */
    public static SizingOptions searchOnly() {
        return new SizingOptions(Optional.empty(), ScatterProgress.NONE, Optional.empty());
    }
}
