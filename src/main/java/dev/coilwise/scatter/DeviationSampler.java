package dev.coilwise.scatter;

import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.random.Well19937c;

/**
 * Draws the normalised deviations of one made spring: each a standard normal variate truncated at ±{@link #SIGMAS}
 * by rejection, so a tolerance half-width is 3σ and no made spring lies outside its tolerance. Five draws per made
 * spring, always in the order d, D, L0, Na, G, so that designs run with the same seed see the same deviations
 * (common random numbers: a fairer comparison between designs).
 */
final class DeviationSampler {
    /** A tolerance half-width is this many standard deviations: 3 (common practice for process capability). */
    static final double SIGMAS = 3;

    /** Deviations per made spring: d, D, L0, Na, G. */
    static final int DRAWS = 5;

    private final RandomGenerator random;

    /** Seeds a WELL19937c generator (Commons Math), which repeats exactly for a given seed. */
    DeviationSampler(long seed) {
        this.random = new Well19937c(seed);
    }

    /** Fills {@code z} with {@link #DRAWS} truncated standard normal variates. */
    void next(double[] z) {
        for (int i = 0; i < DRAWS; i++) {
            double v;
            do {
                v = random.nextGaussian();
            } while (Math.abs(v) > SIGMAS);
            z[i] = v;
        }
    }
}
