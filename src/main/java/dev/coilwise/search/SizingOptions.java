package dev.coilwise.search;

import dev.coilwise.scatter.ScatterProgress;
import dev.coilwise.scatter.ScatterSettings;

/**
 * How much checking `size` does beyond the search.
 *
 * @param scatter  Monte Carlo settings; {@code samples == 0} turns the scatter check off (unless the ranking needs it)
 * @param progress told how far the Monte Carlo has got
 */
public record SizingOptions(ScatterSettings scatter, ScatterProgress progress) {
    /** Pool of leading designs, as a multiple of the shortlist length, that robustness ranking draws from. */
    public static final int ROBUSTNESS_POOL = 3;

    public static SizingOptions defaults() {
        return new SizingOptions(ScatterSettings.defaults(), ScatterProgress.NONE);
    }
}
