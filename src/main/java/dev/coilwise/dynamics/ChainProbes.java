package dev.coilwise.dynamics;

/**
 * Quantities read off a state of the chain from its geometry alone (safe on interpolated states): the force between
 * spring and load, the largest wire force of any element and its corrected stress, and the mechanical energy.
 */
final class ChainProbes {
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

    /** Compressive force in the top element, wire plus coil contact, N. */
    double topForce(double[] y) {
        int top = chain.elements();
        return chain.elementRate() * face.geometricDeformation(top, y) + clash.geometricExtra(top, y);
    }

    /** Largest compressive wire force of any element, k_e·δ_j, N (coil contact excluded). */
    double maxWireForce(double[] y) {
        double max = Double.NEGATIVE_INFINITY;
        for (int j = 1; j <= chain.elements(); j++) {
            max = Math.max(max, face.geometricDeformation(j, y));
        }
        return chain.elementRate() * max;
    }

    /** Largest corrected shear stress of any element, Pa (zero when no element is compressed). */
    double peakStress(double[] y) {
        return stressPerNewton * Math.max(0, maxWireForce(y));
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
