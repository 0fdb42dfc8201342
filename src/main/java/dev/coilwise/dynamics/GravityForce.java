package dev.coilwise.dynamics;

/** Weight along the axis, m·g·sin(angle), on every coil mass and on the load. */
final class GravityForce implements ForceTerm {
    private final LumpedChain chain;
    private final double loadMass;

    /** @param loadMass kg, 0 without a load */
    GravityForce(LumpedChain chain, double loadMass) {
        this.chain = chain;
        this.loadMass = loadMass;
    }

    @Override
    public boolean constant() {
        return true;
    }

    @Override
    public void addForces(double[] y, double[] f) {
        double w = chain.nodeMass() * chain.axialGravity();
        for (int i = 0; i < chain.masses(); i++) {
            f[i] += w;
        }
        f[chain.masses()] += loadMass * chain.axialGravity();
    }
}
