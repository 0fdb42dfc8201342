package dev.coilwise.search;

import dev.coilwise.mechanics.DesignEvaluator;
import dev.coilwise.mechanics.Evaluation;
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
    long evaluated;
    long feasible;

    FamilyBest(Family family, DesignSpace space) {
        this.family = family;
        this.space = space;
        this.by = space.requirement().ranking().by();
        this.order = Objective.comparator(by);
    }

    /** Evaluates one spring, keeps it if it is feasible and better than the incumbent; returns whether feasible. */
    boolean offer(Spring s) {
        Evaluation e = DesignEvaluator.evaluate(s, space.requirement());
        evaluated++;
        if (!e.feasible()) {
            return false;
        }
        feasible++;
        Candidate c = new Candidate(family, e);
        if (best == null || order.compare(c, best) < 0) {
            best = c;
        }
        return true;
    }

    /** Criterion value of the incumbent, or +∞ when there is none. */
    double incumbent() {
        return best == null ? Double.POSITIVE_INFINITY : Objective.value(by, best.evaluation());
    }

    Candidate best() {
        return best;
    }
}
