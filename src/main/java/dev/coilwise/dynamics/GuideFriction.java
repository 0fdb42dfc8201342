package dev.coilwise.dynamics;

import java.util.List;
import org.apache.commons.math3.ode.events.EventHandler;

/**
 * Friction of a launch's guide: a constant force on the payload, towards the base, while the payload moves out
 * inside the guide (below the muzzle, u_L &gt; 0). The muzzle detector, g = u_L, switches it off when the payload
 * passes the muzzle.
 */
final class GuideFriction implements ForceTerm {
    private final int masses;
    private final double force;
    private final JobMonitor monitor;
    private boolean inGuide;

    /** @param force N, ≥ 0 */
    GuideFriction(int masses, double force, JobMonitor monitor) {
        this.masses = masses;
        this.force = force;
        this.monitor = monitor;
    }

    @Override
    public void start(double[] y) {
        inGuide = y[masses] > 0;
    }

    @Override
    public void addForces(double[] y, double[] f) {
        if (inGuide) {
            f[masses] += force;
        }
    }

    @Override
    public List<EventHandler> detectors() {
        return List.of(new EventHandler() {
            @Override
            public void init(double t0, double[] y0, double t) {
            }

            @Override
            public double g(double t, double[] y) {
                return y[masses];
            }

            @Override
            public Action eventOccurred(double t, double[] y, boolean increasing) {
                inGuide = increasing;
                Action a = monitor.onPassing(t, y, !increasing);
                return a == Action.STOP ? Action.STOP : Action.RESET_DERIVATIVES;
            }

            @Override
            public void resetState(double t, double[] y) {
            }
        });
    }
}
