package dev.coilwise.search;

import static org.assertj.core.api.Assertions.assertThat;

import dev.coilwise.mechanics.DesignEvaluator;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.mechanics.HardLimits;
import dev.coilwise.mechanics.Stress;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The bounds of the pruned search are necessary conditions: every feasible design meets them. Feasible designs are
 * gathered around the family bests of generated requirements (every family best moved by up to two steps of mean
 * diameter, two quarter coils and three steps of free length), where the bounds are tightest, and each is checked
 * against the rate window, the criterion's lower bounds and, for an arrest into a pocket, the preload window and the
 * coil-bind test.
 */
class SearchBoundsTest {
    private static final double ROUNDING = 1e-9;

    @Test
    void everyFeasibleDesignNearTheOptimaMeetsEveryBound() {
        List<Requirement> reqs = RequirementGenerator.generate(77L, 40);
        int checked = 0;
        int pocketChecked = 0;
        for (Requirement req : reqs) {
            DesignSpace space = DesignSpace.of(req, SearchFixtures.TABLE);
            for (Candidate c : new PrunedSearch().run(space).top(6)) {
                for (Spring s : neighbours(space, c.evaluation().spring())) {
                    Evaluation e = DesignEvaluator.evaluate(s, req);
                    if (!e.feasible()) {
                        continue;
                    }
                    checkBounds(req, space, c.family(), e);
                    checked++;
                    pocketChecked += req.isArrest() && req.envelope().pocketLength().isPresent() ? 1 : 0;
                }
            }
        }
        assertThat(checked).as("feasible designs checked").isGreaterThan(2000);
        assertThat(pocketChecked).as("of which with a pocket").isGreaterThan(200);
    }

    private static void checkBounds(Requirement req, DesignSpace space, Family f, Evaluation e) {
        Spring s = e.spring();
        HardLimits limits = HardLimits.of(req, f.material(), f.wireDiameter());
        double fAllow = Stress.forceFor(limits.allowableStress(), s.meanDiameter(), s.wireDiameter());
        double xi = req.spring().clashAllowance();
        double maxForce = req.spring().solidSafe() ? fAllow / (1 + xi) : fAllow;
        maxForce = Math.min(maxForce, req.limits().peakForce().orElse(Double.POSITIVE_INFINITY));
        if (req.job() instanceof Arrest a && req.limits().deceleration().isPresent()) {
            maxForce = Math.min(maxForce, a.mass() * req.limits().deceleration().getAsDouble() + a.pushForce());
        }
        String what = s + " for " + req.title();
        RateBounds rb = RateBounds.of(req, maxForce * (1 + FamilyScan.TIE_SLACK));
        assertThat(e.rate()).as("rate within the rate bounds: " + what)
                .isBetween(rb.low() * (1 - ROUNDING), rb.high() * (1 + ROUNDING));

        CriterionBound bound = new CriterionBound(req, f, limits.shearModulus());
        double value = Objective.value(req.ranking().by(), e);
        assertThat(bound.at(s.meanDiameter(), s.activeCoils())).as("criterion bound: " + what)
                .isLessThanOrEqualTo(value * (1 + ROUNDING));
        assertThat(bound.tight(s.meanDiameter(), s.activeCoils())).as("cell bound: " + what)
                .isLessThanOrEqualTo(value * (1 + ROUNDING));
        assertThat(bound.mass(s.meanDiameter(), s.activeCoils())).isLessThanOrEqualTo(e.mass() * (1 + ROUNDING));

        if (req.job() instanceof Arrest a && req.envelope().pocketLength().isPresent()) {
            double pocket = req.envelope().pocketLength().getAsDouble();
            PreloadWindow w = PreloadWindow.of(e.rate(), s.solidLength(), pocket, a.kineticEnergy(), a.pushForce(),
                    req.limits().stroke(), maxForce * (1 + FamilyScan.TIE_SLACK), xi,
                    req.spring().solidSafe() ? fAllow * (1 + FamilyScan.TIE_SLACK) : Double.POSITIVE_INFINITY,
                    req.envelope().maxFreeLength().orElse(Double.POSITIVE_INFINITY));
            double u = s.freeLength() - pocket;
            double tol = 1e-6 * pocket;
            assertThat(u).as("preload deflection within the preload window: " + what)
                    .isBetween(w.low() - tol, w.high() + tol);
            assertThat(PreloadWindow.bindPossible(e.rate(), s.solidLength(), pocket, a.kineticEnergy(), a.pushForce(), xi))
                    .as("coil bind possible: " + what).isTrue();
        }
    }

    /** Valid springs of the same family within a few grid steps of {@code s}. */
    private static List<Spring> neighbours(DesignSpace space, Spring s) {
        Grid g = space.grid();
        long jd = Math.round(s.meanDiameter() / g.step());
        long jn = Math.round(s.activeCoils() / Grid.COIL_STEP);
        long jl = Math.round(s.freeLength() / g.step());
        java.util.ArrayList<Spring> out = new java.util.ArrayList<>();
        for (long a = -2; a <= 2; a++) {
            for (long b = -2; b <= 2; b++) {
                for (long c = -3; c <= 3; c++) {
                    double dm = g.length(jd + a);
                    double na = g.coils(jn + b);
                    double l0 = g.length(jl + c);
                    double ls = s.ends().solidLength(s.wireDiameter(), s.ends().totalCoils(na));
                    if (na > 0 && l0 > ls && dm > 0.75 * s.wireDiameter()) {
                        out.add(new Spring(s.material(), s.ends(), s.wireDiameter(), dm, na, l0));
                    }
                }
            }
        }
        return out;
    }
}
