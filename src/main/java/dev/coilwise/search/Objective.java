package dev.coilwise.search;

import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.RankBy;
import java.util.Comparator;

/**
 * Ranking of designs: the chosen criterion (smaller is better), then spring mass, mean diameter, active coils, free
 * length and family order, so that every search breaks ties the same way.
 */
public final class Objective {
    private Objective() {
    }

    /** Value of the criterion for one design, SI; smaller is better. Robustness pre-ranks by mass. */
    public static double value(RankBy by, Evaluation e) {
        return switch (by) {
            case MASS, ROBUSTNESS -> e.mass();
            case COST -> e.cost();
            case PEAK_FORCE -> e.peakForce();
            case SOLID_LENGTH -> e.spring().solidLength();
            case OUTER_DIAMETER -> e.spring().outerDiameter();
            case FREE_LENGTH -> e.spring().freeLength();
        };
    }

    /** Total order on candidates of the search. */
    public static Comparator<Candidate> comparator(RankBy by) {
        return Comparator.<Candidate>comparingDouble(c -> value(by, c.evaluation()))
                .thenComparingDouble(c -> c.evaluation().mass())
                .thenComparingDouble(c -> c.evaluation().spring().meanDiameter())
                .thenComparingDouble(c -> c.evaluation().spring().activeCoils())
                .thenComparingDouble(c -> c.evaluation().spring().freeLength())
                .thenComparingInt(c -> c.family().order());
    }

    /** Whether the criterion never decreases as active coils are added at a fixed wire and coil diameter. */
    static boolean nonDecreasingInCoils(RankBy by) {
        return by == RankBy.MASS || by == RankBy.COST || by == RankBy.SOLID_LENGTH || by == RankBy.OUTER_DIAMETER
                || by == RankBy.ROBUSTNESS;
    }

    /** Whether the criterion depends on the free length chosen within one cell (so every feasible length is tried). */
    static boolean dependsOnFreeLength(RankBy by) {
        return by == RankBy.PEAK_FORCE || by == RankBy.FREE_LENGTH;
    }
}
