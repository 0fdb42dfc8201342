package dev.coilwise.dynamics;

import org.apache.commons.math3.ode.events.EventHandler;

/**
 * The load passing a fixed level: g = u_L − level, m. Falling through zero the load moves out past the level;
 * rising, it comes back in. The job reads it through {@link JobMonitor#onPassing}.
 */
final class LevelDetector implements EventHandler {
    private final int masses;
    private final double level;
    private final JobMonitor monitor;

    /** @param level m towards the base from free length */
    LevelDetector(int masses, double level, JobMonitor monitor) {
        this.masses = masses;
        this.level = level;
        this.monitor = monitor;
    }

    @Override
    public void init(double t0, double[] y0, double t) {
    }

    @Override
    public double g(double t, double[] y) {
        return y[masses] - level;
    }

    @Override
    public Action eventOccurred(double t, double[] y, boolean increasing) {
        return monitor.onPassing(t, y, !increasing);
    }

    @Override
    public void resetState(double t, double[] y) {
    }
}
