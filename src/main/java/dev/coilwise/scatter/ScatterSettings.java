package dev.coilwise.scatter;

import dev.coilwise.error.BadInputException;
import dev.coilwise.error.Check;

/**
 * How a Monte Carlo run samples and what it counts as a launch that meets its requirement.
 *
 * @param samples         made springs drawn per design (100 .. 10⁷)
 * @param seed            seed of the random generator; the same seed gives the same result
 * @param heightShortfall launch only: how far below the target apex rise a made spring may throw and still meet
 *                        the requirement, fraction of the target (0 .. 1)
 * @param heightOvershoot launch only: how far above the target it may throw, fraction (≥ 0, may be +∞)
 */
public record ScatterSettings(int samples, long seed, double heightShortfall, double heightOvershoot) {
    /** Default number of samples per design: 10 000. */
    public static final int DEFAULT_SAMPLES = 10_000;

    /** Default seed: 1 (arbitrary; fixed so that runs repeat). */
    public static final long DEFAULT_SEED = 1L;

    /**
     * Default band of the launch apex, ±5 % of the target: coilwise's own choice, not a published figure. A band
     * rather than "at least the target" because the search sets the cocked length for the target exactly, so about
     * half of any design's made springs fall short and a one-sided count would not tell designs apart.
     */
    public static final double DEFAULT_HEIGHT_BAND = 0.05;

    public ScatterSettings {
        if (samples < 100 || samples > 10_000_000) {
            throw new BadInputException("Monte Carlo samples must lie between 100 and 10000000, got " + samples);
        }
        Check.inRange("launch height shortfall", heightShortfall, 0, 1, "(fraction)");
        if (Double.isNaN(heightOvershoot) || heightOvershoot < 0) {
            throw new BadInputException("launch height overshoot must be a fraction ≥ 0, got " + heightOvershoot);
        }
    }

    public static ScatterSettings defaults() {
        return new ScatterSettings(DEFAULT_SAMPLES, DEFAULT_SEED, DEFAULT_HEIGHT_BAND, DEFAULT_HEIGHT_BAND);
    }

    public ScatterSettings withSeed(long s) {
        return new ScatterSettings(samples, s, heightShortfall, heightOvershoot);
    }

    public ScatterSettings withSamples(int n) {
        return new ScatterSettings(n, seed, heightShortfall, heightOvershoot);
    }
}
