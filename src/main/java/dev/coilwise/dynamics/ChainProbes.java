package dev.coilwise.dynamics;

import java.util.ArrayList;
import java.util.List;

/**
 * Quantities read off a state of the chain from its geometry alone (safe on interpolated states): the force between
 * spring and load, the largest corrected stress of any element, and the mechanical energy; and the gauges from whose
 * largest values {@link PeakTracker} gives the peaks of the first two.
 */
final class ChainProbes {
    /** Gauge group of the load position. */
    static final int LOAD = 0;
    /** Gauge group of the top element's closure. */
    static final int TOP = 1;
    /** Gauge group of the closures of elements 1..N. */
    static final int LOWER = 2;
    /** Number of gauge groups. */
    static final int GROUPS = 3;

    private final LumpedChain chain;
    private final TopFace face;
    private final ClashForce clash;
    private final double stressPerNewton;

    /** @param stressPerNewton corrected shear stress per newton of element force, Pa/N (K_B·8D/(πd³)) */
    ChainProbes(LumpedChain chain, TopFace face, ClashForce clash, double stressPerNewton) {
        this.chain = chain;
        this.face = face;
        this.clash = clash;
        this.stressPerNewton = stressPerNewton;
    }

    /**
     * The gauges whose largest values over a run give its peaks ({@link PeakTracker}): the load position (group
     * {@link #LOAD}); the top element's closure, max(0, u_L − u_N, stop − u_N), as its two smooth parts (group
     * {@link #TOP}, the 0 applied by {@link #topForceOf}); and the closure of every other element (group
     * {@link #LOWER}). The largest of a maximum of functions is the largest of their largest values, and the top force
     * and the stress grow with the closure, so the peaks follow from these maxima exactly.
     */
    List<PeakTracker.Gauge> gauges() {
        int n = chain.masses();
        List<PeakTracker.Gauge> g = new ArrayList<>();
        g.add(new PeakTracker.Gauge(n, -1, 0, LOAD));
        if (face.loadPresent()) {
            g.add(new PeakTracker.Gauge(n, n - 1, 0, TOP));
        }
        if (face.hasStop()) {
            g.add(new PeakTracker.Gauge(-1, n - 1, face.stop(), TOP));
        }
        for (int j = 1; j <= n; j++) {
            g.add(new PeakTracker.Gauge(j - 1, j - 2, 0, LOWER));
        }
        return g;
    }

    /** Compressive force in the top element, wire plus coil contact, N. */
    double topForce(double[] y) {
        return topForceOf(face.geometricDeformation(chain.elements(), y));
    }

    /**
     * Compressive force of the top element at closure {@code closure} (m; a negative one counts as 0), wire plus
     * coil contact, N. It grows with the closure.
     */
    double topForceOf(double closure) {
        double d = Math.max(0, closure);
        return chain.elementRate() * d + chain.clashRate() * Math.max(0, d - chain.clashClosure());
    }

    /** Corrected shear stress of an element at closure {@code closure}, m, Pa (zero unless compressed). */
    double stressOf(double closure) {
        return stressPerNewton * Math.max(0, chain.elementRate() * closure);
    }

    /** Largest corrected shear stress of any element, Pa (zero when no element is compressed). */
    double peakStress(double[] y) {
        double max = Double.NEGATIVE_INFINITY;
        for (int j = 1; j <= chain.elements(); j++) {
            max = Math.max(max, face.geometricDeformation(j, y));
        }
        return stressOf(max);
    }

    /**
     * Mechanical energy, J: kinetic energy of coils and load, strain energy of the elements and of touching coils,
     * and the potentials of gravity and of a constant force on the load (zero at free length).
     *
     * @param loadMass  kg (0 without a load)
     * @param loadForce constant force on the load towards the base, N
     */
    double energy(double[] y, double loadMass, double loadForce) {
        int n = chain.masses();
        double m = chain.nodeMass();
        double ke = chain.elementRate();
        double e = 0;
        for (int i = 0; i < n; i++) {
            double v = y[n + 1 + i];
            e += 0.5 * m * v * v - m * chain.axialGravity() * y[i];
        }
        for (int j = 1; j <= chain.elements(); j++) {
            double d = face.geometricDeformation(j, y);
            double c = clash.geometricExtra(j, y);
            e += 0.5 * ke * d * d + 0.5 * c * c / chain.clashRate();
        }
        if (loadMass > 0) {
            double v = y[2 * n + 1];
            e += 0.5 * loadMass * v * v - (loadMass * chain.axialGravity() + loadForce) * y[n];
        }
        return e;
    }
}
