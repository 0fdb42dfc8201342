package dev.coilwise.dynamics;

import org.apache.commons.math3.ode.events.EventHandler;

/**
 * The top mass passing the end stop of a preloaded pocket: g = u_N − stop, m. Falling through zero, the stop starts
 * holding the face (the spring would otherwise extend past its installed length); rising, it lets go.
 */
final class SeatDetector implements EventHandler {
    private final TopFace face;

    SeatDetector(TopFace face) {
        this.face = face;
    }

    @Override
    public void init(double t0, double[] y0, double t) {
    }

    @Override
    public double g(double t, double[] y) {
        return face.seatGap(y);
    }

    @Override
    public Action eventOccurred(double t, double[] y, boolean increasing) {
        face.setOnStop(!increasing);
        return Action.RESET_DERIVATIVES;
    }

    @Override
    public void resetState(double t, double[] y) {
    }
}
