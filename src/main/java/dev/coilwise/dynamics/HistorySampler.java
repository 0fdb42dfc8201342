package dev.coilwise.dynamics;

import java.util.function.ToDoubleFunction;
import org.apache.commons.math3.ode.sampling.StepHandler;
import org.apache.commons.math3.ode.sampling.StepInterpolator;

/**
 * Samples the time history at a fixed interval on the interpolated solution, plus the final state. The quantities
 * are computed from the geometry alone (see {@link PeakTracker}).
 */
final class HistorySampler implements StepHandler {
    private final double interval;
    private final ToDoubleFunction<double[]> topForce;
    private final ToDoubleFunction<double[]> peakStress;
    private final int masses;
    private final TimeHistory.Builder out = new TimeHistory.Builder();
    private double next;

    /**
     * @param interval   sampling interval, s
     * @param topForce   force in the top element, N
     * @param peakStress largest corrected stress of any element, Pa
     */
    HistorySampler(int masses, double interval, ToDoubleFunction<double[]> topForce,
                   ToDoubleFunction<double[]> peakStress) {
        this.masses = masses;
        this.interval = interval;
        this.topForce = topForce;
        this.peakStress = peakStress;
    }

    TimeHistory history() {
        return out.build();
    }

    @Override
    public void init(double t0, double[] y0, double t) {
        record(t0, y0);
        next = t0 + interval;
    }

    @Override
    public void handleStep(StepInterpolator interpolator, boolean isLast) {
        double t1 = interpolator.getCurrentTime();
        while (next < t1) {
            interpolator.setInterpolatedTime(next);
            record(next, interpolator.getInterpolatedState());
            next += interval;
        }
        if (isLast) {
            interpolator.setInterpolatedTime(t1);
            record(t1, interpolator.getInterpolatedState());
        }
    }

    private void record(double t, double[] y) {
        out.add(t, y[masses], y[2 * masses + 1], topForce.applyAsDouble(y), peakStress.applyAsDouble(y));
    }
}
