package dev.coilwise.scatter;

/**
 * Told how far a Monte Carlo run has got, from the computing thread; the CLI uses it for a progress indicator.
 * Calls come every {@link MonteCarlo#PROGRESS_STEP} samples and once at the end; keep them cheap.
 */
@FunctionalInterface
public interface ScatterProgress {
    /** Does nothing. */
    ScatterProgress NONE = (done, total) -> { };

    /**
     * @param done  samples drawn so far, over every design of the run
     * @param total samples the run will draw
     */
    void advanced(long done, long total);
}
