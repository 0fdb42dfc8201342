package dev.coilwise.dynamics;

import org.apache.commons.math3.ode.events.EventHandler;

/**
 * Contact and separation of the load and the face: g = u_L − max(u_N, stop), m, continuous through its root.
 * Rising through zero the load has caught the face; falling, it has left it, either because the top element
 * unloaded or because the face came back onto the end stop (which then takes the preload over again).
 */
final class ContactDetector implements EventHandler {
    private final TopFace face;
    private final JobMonitor monitor;

    ContactDetector(TopFace face, JobMonitor monitor) {
        this.face = face;
        this.monitor = monitor;
    }

    @Override
    public void init(double t0, double[] y0, double t) {
    }

    @Override
    public double g(double t, double[] y) {
        return face.contactGap(y);
    }

    @Override
    public Action eventOccurred(double t, double[] y, boolean increasing) {
        face.setLoadOn(increasing);
        Action a = monitor.onContact(t, y, increasing);
        return a == Action.STOP ? Action.STOP : Action.RESET_DERIVATIVES;
    }

    @Override
    public void resetState(double t, double[] y) {
    }
}
