package dev.coilwise.search;

import dev.coilwise.materials.Material;
import dev.coilwise.mechanics.DesignEvaluator;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.mechanics.Margin;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import dev.coilwise.model.SpringOptions;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import org.apache.commons.math3.optim.InitialGuess;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.MaxIter;
import org.apache.commons.math3.optim.PointValuePair;
import org.apache.commons.math3.optim.SimpleBounds;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.nonlinear.scalar.ObjectiveFunction;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.CMAESOptimizer;
import org.apache.commons.math3.random.MersenneTwister;

/**
 * A general-purpose baseline for the benchmark only: the requirement solved by Apache Commons Math's CMA-ES over
 * the continuous relaxation of the design, then rounded to the grid and checked with {@link DesignEvaluator}.
 *
 * <p>Per material and end type, the variables are, scaled to [0, 1]: log wire diameter over the material's range
 * within the requirement's wire series, spring index over the requirement's index range, active coils over its coil
 * range, and the free length as Ls plus a share of a span (the pocket plus three strokes, or up to the free-length
 * limit). The minimised function is log(criterion) plus {@value #PENALTY} times the sum of the hard margins that
 * fail (each a fraction of its limit, from the full evaluation). The best point of each run is rounded every way to
 * the grid (the two nearest preferred wires, mean diameter and free length down and up, active coils down and up to a
 * quarter coil) and the best feasible of those, by {@link Objective#comparator}, is the baseline's design.
 */
final class OptimiserBaseline {
    /** Weight of a violated margin (per unit fraction of its limit) against log(criterion). */
    static final double PENALTY = 1e3;
    /** Function evaluations per material and end type. */
    static final int EVALUATIONS = 2500;

    private final long seed;

    OptimiserBaseline(long seed) {
        this.seed = seed;
    }

    /** The baseline's best feasible grid design of {@code space}, or empty when it finds none. */
    Optional<Candidate> solve(DesignSpace space) {
        Requirement req = space.requirement();
        Comparator<Candidate> order = Objective.comparator(req.ranking().by());
        Candidate best = null;
        for (Material m : space.materials()) {
            for (EndType e : space.ends()) {
                List<Family> fams = space.families().stream().filter(f -> f.material() == m && f.ends() == e).toList();
                if (fams.isEmpty()) {
                    continue;
                }
                Candidate c = solve(space, fams);
                if (c != null && (best == null || order.compare(c, best) < 0)) {
                    best = c;
                }
            }
        }
        return Optional.ofNullable(best);
    }

    private Candidate solve(DesignSpace space, List<Family> fams) {
        Relaxation r = new Relaxation(space, fams);
        CMAESOptimizer cma = new CMAESOptimizer(EVALUATIONS, Double.NEGATIVE_INFINITY, true, 0, 0,
                new MersenneTwister(seed), false, null);
        PointValuePair p;
        try {
            p = cma.optimize(new MaxEval(EVALUATIONS), new MaxIter(EVALUATIONS), GoalType.MINIMIZE,
                    new ObjectiveFunction(r::penalised), new InitialGuess(new double[] {0.5, 0.5, 0.5, 0.5}),
                    new SimpleBounds(new double[4], new double[] {1, 1, 1, 1}),
                    new CMAESOptimizer.Sigma(new double[] {0.3, 0.3, 0.3, 0.3}), new CMAESOptimizer.PopulationSize(12));
        } catch (org.apache.commons.math3.exception.TooManyEvaluationsException ex) {
            return r.roundedBest(r.bestSeen);
        }
        return r.roundedBest(r.bestSeen != null ? r.bestSeen : p.getPoint());
    }

    /** The continuous relaxation of one material and end type. */
    private static final class Relaxation {
        private final DesignSpace space;
        private final List<Family> fams;
        private final Requirement req;
        private final double dLo;
        private final double dHi;
        private double bestValue = Double.POSITIVE_INFINITY;
        double[] bestSeen;

        Relaxation(DesignSpace space, List<Family> fams) {
            this.space = space;
            this.fams = fams;
            this.req = space.requirement();
            this.dLo = fams.get(0).wireDiameter();
            this.dHi = fams.get(fams.size() - 1).wireDiameter();
        }

        double d(double u) {
            return dLo * Math.pow(dHi / dLo, u);
        }

        double span(double ls) {
            double s = req.limits().stroke();
            if (req.envelope().maxFreeLength().isPresent()) {
                return Math.max(1e-4, req.envelope().maxFreeLength().getAsDouble() - ls);
            }
            return req.envelope().pocketLength().orElse(0) + 3 * s;
        }

        Spring spring(Family f, double d, double[] x) {
            SpringOptions o = req.spring();
            double c = o.indexMin() + x[1] * (o.indexMax() - o.indexMin());
            double na = o.coilsMin() + x[2] * (o.coilsMax() - o.coilsMin());
            double ls = f.ends().solidLength(d, f.ends().totalCoils(na));
            double l0 = ls + 1e-5 + x[3] * span(ls);
            return new Spring(f.material(), f.ends(), d, c * d, na, l0);
        }

        double penalised(double[] x) {
            Family f = fams.get(0);
            Evaluation e = DesignEvaluator.evaluate(spring(f, d(x[0]), x), req);
            double violation = 0;
            for (Margin m : e.margins()) {
                if (m.hard() && !m.holds()) {
                    violation += Math.min(1e3, -m.value());
                }
            }
            double v = Math.log(Objective.value(req.ranking().by(), e)) + PENALTY * violation;
            if (v < bestValue) {
                bestValue = v;
                bestSeen = x.clone();
            }
            return v;
        }

        /** Rounds {@code x} every way to the grid and keeps the best feasible design, or null. */
        Candidate roundedBest(double[] x) {
            if (x == null) {
                return null;
            }
            Comparator<Candidate> order = Objective.comparator(req.ranking().by());
            Grid g = space.grid();
            double d = d(x[0]);
            Candidate best = null;
            for (Family f : nearestWires(d)) {
                Spring s = spring(f, f.wireDiameter(), x);
                for (long jd : new long[] {g.lengthIndexAtMost(s.meanDiameter()), g.lengthIndexAtLeast(s.meanDiameter())}) {
                    for (double na : new double[] {Math.floor(s.activeCoils() * 4) / 4, Math.ceil(s.activeCoils() * 4) / 4}) {
                        for (long jl : new long[] {g.lengthIndexAtMost(s.freeLength()), g.lengthIndexAtLeast(s.freeLength())}) {
                            Candidate c = check(f, g.length(jd), na, g.length(jl));
                            if (c != null && (best == null || order.compare(c, best) < 0)) {
                                best = c;
                            }
                        }
                    }
                }
            }
            return best;
        }

        private List<Family> nearestWires(double d) {
            Family below = null;
            Family above = null;
            for (Family f : fams) {
                if (f.wireDiameter() <= d) {
                    below = f;
                } else if (above == null) {
                    above = f;
                }
            }
            return java.util.stream.Stream.of(below, above).filter(java.util.Objects::nonNull).toList();
        }

        private Candidate check(Family f, double dm, double na, double l0) {
            double ls = f.ends().solidLength(f.wireDiameter(), f.ends().totalCoils(na));
            if (na <= 0 || l0 <= ls || dm <= 0.75 * f.wireDiameter()) {
                return null;
            }
            Evaluation e = DesignEvaluator.evaluate(new Spring(f.material(), f.ends(), f.wireDiameter(), dm, na, l0), req);
            return e.feasible() ? new Candidate(f, e) : null;
        }
    }
}
