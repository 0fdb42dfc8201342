package dev.coilwise.dynamics;

import java.util.List;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.events.EventHandler;

/**
 * All the switching functions of a run as one: g = p·min_i σ_i·g_i, with σ_i the sign part i has at present
 * (+1 or −1). The minimum is positive until any part reaches zero. At each root every part found at or past zero
 * (σ_i·g_i ≤ 0) is told of its event, in the order given, and its σ_i flips; the parity p flips too, so g keeps the
 * sign it had just past the root and is continuous through it. The integrator therefore sees every crossing of every
 * part as a crossing of g, and the parts' own handlers act as they would alone.
 *
 * <p>Why: Commons Math interpolates the whole state once per step for every event handler, so one handler instead of
 * four or five saves that many interpolations per step. Two parts that cross at the same instant (the load leaving
 * the face where the end stop takes it back, at the point of first contact) are handled in the same event.
 *
 * <p>A part that is exactly zero at the start (the contact gap and the level of an arrest, the load speed of a load
 * or payload at rest) takes the sign it has just after the start, read from a second-order Taylor step of
 * {@value #START_PROBE} time scales along the equations' own derivatives (zero counts as positive, as in Commons
 * Math).
 */
final class CombinedDetector implements EventHandler {
    /** Length of the Taylor step that settles the sign of a part that is zero at the start, in time scales. */
    static final double START_PROBE = 1e-6;

    private final EventHandler[] parts;
    private final FirstOrderDifferentialEquations equations;
    private final int masses;
    private final double probe;
    private final double[] sign;
    private final boolean[] resets;
    private double parity = 1;

    /**
     * @param parts     the switching functions, each continuous through its roots and changing sign there
     * @param equations the equations of the run, for the start's derivatives
     * @param masses    N (layout in {@link TopFace})
     * @param timeScale s
     */
    CombinedDetector(List<EventHandler> parts, FirstOrderDifferentialEquations equations, int masses,
                     double timeScale) {
        this.parts = parts.toArray(new EventHandler[0]);
        this.equations = equations;
        this.masses = masses;
        this.probe = START_PROBE * timeScale;
        this.sign = new double[this.parts.length];
        this.resets = new boolean[this.parts.length];
    }

    @Override
    public void init(double t0, double[] y0, double t) {
        double[] ahead = null;
        for (int i = 0; i < parts.length; i++) {
            parts[i].init(t0, y0, t);
            double g = parts[i].g(t0, y0);
            if (g == 0) {
                if (ahead == null) {
                    ahead = justAfter(t0, y0);
                }
                g = parts[i].g(t0 + probe, ahead);
            }
            sign[i] = g >= 0 ? 1 : -1;
        }
        parity = 1;
    }

    /** The state a short time after {@code t0}: u + δ·v + δ²/2·a for positions, v + δ·a for speeds. */
    private double[] justAfter(double t0, double[] y0) {
        double[] yDot = new double[y0.length];
        equations.computeDerivatives(t0, y0, yDot);
        int speeds = masses + 1;
        double[] y = new double[y0.length];
        for (int i = 0; i < y0.length; i++) {
            y[i] = y0[i] + probe * yDot[i] + (i < speeds ? probe * probe / 2 * yDot[i + speeds] : 0);
        }
        return y;
    }

    @Override
    public double g(double t, double[] y) {
        double min = Double.POSITIVE_INFINITY;
        for (int i = 0; i < parts.length; i++) {
            min = Math.min(min, sign[i] * parts[i].g(t, y));
        }
        return parity * min;
    }

    @Override
    public Action eventOccurred(double t, double[] y, boolean increasing) {
        Action action = Action.CONTINUE;
        int closest = 0;
        double closestValue = Double.POSITIVE_INFINITY;
        double[] values = new double[parts.length];
        for (int i = 0; i < parts.length; i++) {
            values[i] = sign[i] * parts[i].g(t, y);
            if (values[i] < closestValue) {
                closestValue = values[i];
                closest = i;
            }
        }
        for (int i = 0; i < parts.length; i++) {
            // The root lies at or just before t, so its part is at or past zero; should rounding leave none there,
            // the part closest to zero is the one.
            if (values[i] <= 0 || (closestValue > 0 && i == closest)) {
                Action a = parts[i].eventOccurred(t, y, sign[i] < 0);
                resets[i] = a == Action.RESET_STATE;
                action = stronger(action, a);
                sign[i] = -sign[i];
            }
        }
        parity = -parity;
        return action;
    }

    /** The action that does what both ask: stop over reset of the state over reset of the derivatives over go on. */
    private static Action stronger(Action a, Action b) {
        return rank(b) > rank(a) ? b : a;
    }

    private static int rank(Action a) {
        return switch (a) {
            case STOP -> 3;
            case RESET_STATE -> 2;
            case RESET_DERIVATIVES -> 1;
            case CONTINUE -> 0;
        };
    }

    @Override
    public void resetState(double t, double[] y) {
        for (int i = 0; i < parts.length; i++) {
            if (resets[i]) {
                parts[i].resetState(t, y);
                resets[i] = false;
            }
        }
    }
}
