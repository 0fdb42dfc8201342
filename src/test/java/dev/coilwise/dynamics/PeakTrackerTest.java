package dev.coilwise.dynamics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.mechanics.DesignEvaluator;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.Launch;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import java.util.OptionalDouble;
import java.util.function.ToDoubleFunction;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.apache.commons.math3.ode.sampling.StepHandler;
import org.apache.commons.math3.ode.sampling.StepInterpolator;
import org.junit.jupiter.api.Test;

/** The peak search between steps: on polynomials with known maxima, and against a dense search of a real run. */
class PeakTrackerTest {
    // A polynomial of degree five or less is its own quintic Hermite interpolant (the interpolant is unique), so the
    // maximum of p(s) = 1 − (s − 0.37)² must come back exactly: 1 at s = 0.37.
    @Test
    void quadraticIsItsOwnInterpolantAndItsMaximumIsExact() {
        double m = PeakTracker.interiorMax(1 - 0.37 * 0.37, 1 - 0.63 * 0.63, 0.74, -1.26, -2, -2);
        assertThat(m).isCloseTo(1, within(1e-14));
    }

    // No interior maximum when the polynomial rises across the step: p(s) = s.
    @Test
    void risingPolynomialHasNoInteriorMaximum() {
        assertThat(PeakTracker.interiorMax(0, 1, 1, 1, 0, 0)).isEqualTo(Double.NEGATIVE_INFINITY);
    }

    // Burden & Faires, Numerical Analysis, Sec. 3.4 (Hermite interpolation error, from memory): with value, first
    // and second derivative matched at both ends of a step h, |f − H| ≤ h⁶·max|f⁽⁶⁾|/(6!·64). For sin(ωt) over a
    // step of ω·h = 0.6 around its crest the error is at most 0.6⁶/46080 = 1.01e-6.
    @Test
    void crestOfASineWithinTheHermiteErrorBoundBurdenFaires() {
        double wh = 0.6;
        for (double start : new double[]{Math.PI / 2 - 0.55, Math.PI / 2 - 0.3, Math.PI / 2 - 0.05}) {
            double end = start + wh;
            double m = PeakTracker.interiorMax(Math.sin(start), Math.sin(end), wh * Math.cos(start),
                    wh * Math.cos(end), -wh * wh * Math.sin(start), -wh * wh * Math.sin(end));
            assertThat(m).as("step from %.2f rad", start).isCloseTo(1, within(Math.pow(wh, 6) / 46080));
        }
    }

    /** Largest value of a quantity over a run, each step searched on the integrator's own dense output. */
    private static final class DenseSearch implements StepHandler {
        private final ToDoubleFunction<double[]> q;
        double max = Double.NEGATIVE_INFINITY;

        DenseSearch(ToDoubleFunction<double[]> q) {
            this.q = q;
        }

        @Override
        public void init(double t0, double[] y0, double t) {
            max = Math.max(max, q.applyAsDouble(y0));
        }

        @Override
        public void handleStep(StepInterpolator i, boolean isLast) {
            double t0 = i.getPreviousTime();
            double h = i.getCurrentTime() - t0;
            int samples = 32;
            int best = 0;
            double bestValue = Double.NEGATIVE_INFINITY;
            for (int k = 0; k <= samples; k++) {
                i.setInterpolatedTime(t0 + h * k / samples);
                double v = q.applyAsDouble(i.getInterpolatedState());
                if (v > bestValue) {
                    bestValue = v;
                    best = k;
                }
            }
            double lo = t0 + h * Math.max(0, best - 1) / samples;
            double hi = t0 + h * Math.min(samples, best + 1) / samples;
            double refined = new BrentOptimizer(1e-12, 1e-6 * h).optimize(new MaxEval(200), GoalType.MAXIMIZE,
                    new SearchInterval(lo, hi, t0 + h * best / samples), new UnivariateObjectiveFunction(t -> {
                        i.setInterpolatedTime(t);
                        return q.applyAsDouble(i.getInterpolatedState());
                    })).getValue();
            max = Math.max(max, Math.max(bestValue, refined));
        }
    }

    /** Runs {@code r} and checks the summary's peaks against a dense search of the same solution. */
    private static void assertPeaksMatchDenseSearch(Spring spring, Requirement r) {
        Evaluation e = DesignEvaluator.evaluate(spring, r);
        EventRun run;
        java.util.function.Supplier<SimulationResult> simulate;
        if (r.job() instanceof Arrest a) {
            ArrestSimulation sim = new ArrestSimulation(spring, a, e, SimulationOptions.defaults());
            run = sim.run();
            simulate = sim::simulate;
        } else {
            LaunchSimulation sim = new LaunchSimulation(spring, (Launch) r.job(), e, SimulationOptions.defaults());
            run = sim.run();
            simulate = sim::simulate;
        }
        DenseSearch force = new DenseSearch(run.probes()::topForce);
        DenseSearch stress = new DenseSearch(run.probes()::peakStress);
        run.observe(force).observe(stress);
        SimulationSummary s = simulate.get().summary();
        assertThat(s.peakForce()).isCloseTo(force.max, within(1e-6 * force.max));
        assertThat(s.peakStress()).isCloseTo(stress.max, within(1e-6 * stress.max));
    }

    // Consistency: the tracker's peaks are those of the solution it is handed, to 1e-6 (a drop, a drop past solid
    // with coil clash, a ramp into a preloaded pocket with a drive force, launches of a heavy and a light payload).
    @Test
    void peaksMatchADenseSearchOfTheSameSolution() {
        Spring spring = Fixtures.spring();
        assertPeaksMatchDenseSearch(spring, Fixtures.drop(2, 0.02));
        assertPeaksMatchDenseSearch(spring, Fixtures.drop(2, 0.30));
        assertPeaksMatchDenseSearch(spring, Fixtures.requirement(new Arrest(2, 1.0, Math.toRadians(30), 20,
                Double.NaN), OptionalDouble.of(0.070)));
        assertPeaksMatchDenseSearch(spring, Fixtures.launch(0.2, 0.5, Math.PI / 2, 0.1));
        assertPeaksMatchDenseSearch(spring, Fixtures.launch(spring.activeMass() / 5, 0.5, Math.PI / 2, 0));
    }
}
