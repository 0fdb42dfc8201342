package dev.coilwise.dynamics;

import org.apache.commons.math3.ode.events.EventHandler;

/**
 * The load's speed passing zero: g = v_L, m/s (positive towards the base). An arrest's load stops when it falls
 * through zero; a launch's payload reaches its highest point in the guide when it rises through zero.
 */
final class LoadSpeedDetector implements EventHandler {
    private final int masses;
    private final JobMonitor monitor;

    LoadSpeedDetector(int masses, JobMonitor monitor) {
        this.masses = masses;
        this.monitor = monitor;
    }

    @Override
    public void init(double t0, double[] y0, double t) {
    }

    @Override
    public double g(double t, double[] y) {
        return y[2 * masses + 1];
    }

    @Override
    public Action eventOccurred(double t, double[] y, boolean increasing) {
        return monitor.onLoadSpeedZero(t, y, increasing);
    }

    @Override
    public void resetState(double t, double[] y) {
    }
}
