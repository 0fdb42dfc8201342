package dev.coilwise.dynamics;

import java.util.List;
import org.apache.commons.math3.ode.events.EventHandler;

/**
 * Coil clash: once element j has closed by the clash closure s_c = (L0 − Ls)/(N + 1), its coils touch and it gets an
 * extra one-way rate k_c (100·k_e) on the closure beyond s_c. The switches are set by one detector for all elements
 * (see {@link Detector}), which also records the first clash.
 */
final class ClashForce implements ForceTerm {
    private final LumpedChain chain;
    private final TopFace face;
    private final boolean[] clashed;
    private int clashedCount;
    private double firstTime = Double.NaN;
    private int firstElement;

    ClashForce(LumpedChain chain, TopFace face) {
        this.chain = chain;
        this.face = face;
        this.clashed = new boolean[chain.elements() + 1];
    }

    @Override
    public void start(double[] y) {
        clashedCount = 0;
        for (int j = 1; j <= chain.elements(); j++) {
            clashed[j] = face.geometricDeformation(j, y) > chain.clashClosure();
            clashedCount += clashed[j] ? 1 : 0;
            if (clashed[j] && Double.isNaN(firstTime)) {
                firstTime = 0;
                firstElement = j;
            }
        }
    }

    @Override
    public void addForces(double[] y, double[] f) {
        if (clashedCount == 0) {
            return;
        }
        double sc = chain.clashClosure();
        double kc = chain.clashRate();
        int n = chain.masses();
        for (int j = 1; j <= n; j++) {
            if (clashed[j]) {
                TopFace.applyElementForce(j, kc * (face.deformation(j, y) - sc), f);
            }
        }
        if (clashed[n + 1]) {
            face.applyTopForce(kc * (face.deformation(n + 1, y) - sc), f);
        }
    }

    /** Extra force of element j from coil contact, from the geometry alone, N. */
    double geometricExtra(int j, double[] y) {
        return chain.clashRate() * Math.max(0, face.geometricDeformation(j, y) - chain.clashClosure());
    }

    /** Time of the first clash, s, or NaN. */
    double firstTime() {
        return firstTime;
    }

    /** Element (1 = at the base, N + 1 = at the top) of the first clash, or 0. */
    int firstElement() {
        return firstElement;
    }

    @Override
    public List<EventHandler> detectors() {
        return List.of(new Detector());
    }

    /**
     * One switching function for every element: g = p·min_j σ_j·(δ_j − s_c), with σ_j = +1 for a clashed element and
     * −1 otherwise, so the minimum is positive while every switch matches the geometry and reaches zero when any
     * element closes to s_c or opens again. At each root the element found there flips its switch and the parity p
     * flips too, so g keeps the sign it had just past the root: it is continuous through every root, and the
     * integrator (which does not re-evaluate g after an event) sees only true crossings. One detector instead of
     * N + 1 keeps the cost of event checking independent of N.
     */
    private final class Detector implements EventHandler {
        private double parity = 1;

        @Override
        public void init(double t0, double[] y0, double t) {
        }

        private double margin(int j, double[] y) {
            double m = face.geometricDeformation(j, y) - chain.clashClosure();
            return clashed[j] ? m : -m;
        }

        @Override
        public double g(double t, double[] y) {
            double min = Double.POSITIVE_INFINITY;
            for (int j = 1; j <= chain.elements(); j++) {
                min = Math.min(min, margin(j, y));
            }
            return parity * min;
        }

        @Override
        public Action eventOccurred(double t, double[] y, boolean increasing) {
            int at = 1;
            double best = Double.POSITIVE_INFINITY;
            for (int j = 1; j <= chain.elements(); j++) {
                double m = Math.abs(margin(j, y));
                if (m < best) {
                    best = m;
                    at = j;
                }
            }
            clashed[at] = !clashed[at];
            clashedCount += clashed[at] ? 1 : -1;
            if (clashed[at] && Double.isNaN(firstTime)) {
                firstTime = t;
                firstElement = at;
            }
            parity = -parity;
            return Action.RESET_DERIVATIVES;
        }

        @Override
        public void resetState(double t, double[] y) {
        }
    }
}
