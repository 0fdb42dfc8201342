package dev.coilwise.dynamics;

import java.util.List;
import java.util.function.ToDoubleFunction;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.apache.commons.math3.optim.univariate.UnivariatePointValuePair;
import org.apache.commons.math3.ode.sampling.StepHandler;
import org.apache.commons.math3.ode.sampling.StepInterpolator;

/**
 * Largest values over the run of some quantities of the state, found on the interpolated solution: each step is
 * sampled at {@value #SAMPLES} points, and a maximum inside the step that may beat the largest so far is refined
 * with Brent's method on the step's interpolant. The quantities must be computed from the geometry alone (the
 * switches may already have moved on when a step is handed over).
 */
final class PeakTracker implements StepHandler {
    /** Samples per step. */
    static final int SAMPLES = 6;
    /** A sampled maximum within this share of the largest so far is refined. */
    static final double REFINE_WINDOW = 1e-2;
    /** Evaluations allowed to refine one peak. */
    static final int REFINE_EVALUATIONS = 200;

    private final List<ToDoubleFunction<double[]>> quantities;
    private final double[] max;
    private final double[] sample;
    private final double[][] samples;

    PeakTracker(List<ToDoubleFunction<double[]>> quantities) {
        this.quantities = List.copyOf(quantities);
        int q = quantities.size();
        this.max = new double[q];
        this.sample = new double[SAMPLES + 1];
        this.samples = new double[q][SAMPLES + 1];
        java.util.Arrays.fill(max, Double.NEGATIVE_INFINITY);
    }

    /** The largest value of quantity {@code i}, in its own unit. */
    double max(int i) {
        return max[i];
    }

    @Override
    public void init(double t0, double[] y0, double t) {
        for (int i = 0; i < max.length; i++) {
            max[i] = Math.max(max[i], quantities.get(i).applyAsDouble(y0));
        }
    }

    @Override
    public void handleStep(StepInterpolator interpolator, boolean isLast) {
        double t0 = interpolator.getPreviousTime();
        double t1 = interpolator.getCurrentTime();
        double h = (t1 - t0) / SAMPLES;
        if (!(h > 0)) {
            return;
        }
        for (int k = 1; k <= SAMPLES; k++) {
            sample[k] = k == SAMPLES ? t1 : t0 + k * h;
            interpolator.setInterpolatedTime(sample[k]);
            double[] y = interpolator.getInterpolatedState();
            for (int i = 0; i < max.length; i++) {
                samples[i][k] = quantities.get(i).applyAsDouble(y);
            }
        }
        for (int i = 0; i < max.length; i++) {
            int best = 1;
            for (int k = 2; k <= SAMPLES; k++) {
                if (samples[i][k] > samples[i][best]) {
                    best = k;
                }
            }
            double v = samples[i][best];
            if (best < SAMPLES && v >= max[i] - Math.abs(max[i]) * REFINE_WINDOW) {
                v = Math.max(v, refine(interpolator, quantities.get(i), t0 + (best - 1) * h, sample[best + 1],
                        sample[best]));
            }
            max[i] = Math.max(max[i], v);
        }
    }

    private static double refine(StepInterpolator interpolator, ToDoubleFunction<double[]> q, double lo, double hi,
                                 double start) {
        UnivariatePointValuePair p = new BrentOptimizer(1e-10, 1e-14 * Math.abs(hi - lo)).optimize(
                new MaxEval(REFINE_EVALUATIONS), GoalType.MAXIMIZE, new SearchInterval(lo, hi, start),
                new UnivariateObjectiveFunction(t -> {
                    interpolator.setInterpolatedTime(t);
                    return q.applyAsDouble(interpolator.getInterpolatedState());
                }));
        return p.getValue();
    }
}
