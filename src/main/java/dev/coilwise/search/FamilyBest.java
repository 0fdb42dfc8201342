package dev.coilwise.search;

import dev.coilwise.error.InternalFaultException;
import dev.coilwise.mechanics.DesignEvaluator;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.mechanics.HardLimits;
import dev.coilwise.model.RankBy;
import dev.coilwise.model.Spring;
import java.util.Comparator;

/** Mutable accumulator of one family's search: its incumbent best and its counters. Confined to one thread. */
final class FamilyBest {
    private final Family family;
    private final DesignSpace space;
    private final RankBy by;
    private final Comparator<Candidate> order;
    private Candidate best;
    private double incumbent = Double.POSITIVE_INFINITY;
    private double incumbentMass = Double.POSITIVE_INFINITY;
    long evaluated;
    long feasible;

    FamilyBest(Family family, DesignSpace space) {
        this.family = family;
        this.space = space;
        this.by = space.requirement().ranking().by();
        this.order = Objective.comparator(by);
    }

    /** Evaluates one spring in full, keeps it if it is feasible and better than the incumbent; returns whether feasible. */
    boolean offer(Spring s) {
        Evaluation e = DesignEvaluator.evaluate(s, space.requirement());
        evaluated++;
        if (!e.feasible()) {
            return false;
        }
        keep(e);
        return true;
    }

    /**
     * Checks one design of this family with {@code limits} (this family's {@link HardLimits}) and evaluates it in full
     * only when it passes; keeps it if it is better than the incumbent. Returns whether it is feasible.
     */
    boolean offer(HardLimits limits, double meanDiameter, double activeCoils, double freeLength) {
        evaluated++;
        if (!limits.feasible(family.ends(), meanDiameter, activeCoils, freeLength)) {
            return false;
        }
        Spring s = new Spring(family.material(), family.ends(), family.wireDiameter(), meanDiameter, activeCoils,
                freeLength);
        Evaluation e = DesignEvaluator.evaluate(s, space.requirement());
        if (!e.feasible()) {
            throw new InternalFaultException("the quick feasibility check passed " + s
                    + ", which the full evaluation rejects on " + e.violations());
        }
        keep(e);
        return true;
    }

    private void keep(Evaluation e) {
        feasible++;
        Candidate c = new Candidate(family, e);
        if (best == null || order.compare(c, best) < 0) {
            best = c;
            incumbent = Objective.value(by, e);
            incumbentMass = e.mass();
        }
    }

    /** Criterion value of the incumbent, or +∞ when there is none. */
    double incumbent() {
        return incumbent;
    }

    /** Mass of the incumbent, kg, or +∞ when there is none. */
    double incumbentMass() {
        return incumbentMass;
    }

    Candidate best() {
        return best;
    }
}
