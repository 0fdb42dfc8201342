package dev.coilwise.dynamics;

/**
 * A constant force on the load along the axis, N, towards the base: the drive force of an arrest. A launch's guide
 * friction is a {@link GuideFriction}, which also switches off at the muzzle.
 */
final class LoadForce implements ForceTerm {
    private final int masses;
    private final double force;

    LoadForce(int masses, double force) {
        this.masses = masses;
        this.force = force;
    }

    @Override
    public boolean constant() {
        return true;
    }

    @Override
    public void addForces(double[] y, double[] f) {
        f[masses] += force;
    }
}
