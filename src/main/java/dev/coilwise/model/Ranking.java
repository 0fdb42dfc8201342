package dev.coilwise.model;

import java.util.OptionalDouble;

/**
 * How feasible designs are ordered and how many are kept.
 *
 * @param by             the criterion
 * @param shortlist      how many designs to keep (1..100)
 * @param prefer         stock or custom first, or neither
 * @param dynamicsStrict keep only designs whose simulated figures meet every hard limit (see
 *                       {@code dynamics.SimulatedLimits}); otherwise the simulation only warns
 * @param minProbability smallest Monte Carlo probability that every limit holds, or empty
 */
public record Ranking(RankBy by, int shortlist, Prefer prefer, boolean dynamicsStrict, OptionalDouble minProbability) {
    public Ranking {
        if (shortlist < 1 || shortlist > 100) {
            throw new dev.coilwise.error.BadInputException("ranking.shortlist must be between 1 and 100, got " + shortlist);
        }
    }

    public static Ranking defaults() {
        return new Ranking(RankBy.MASS, 10, Prefer.NONE, false, OptionalDouble.empty());
    }
}
