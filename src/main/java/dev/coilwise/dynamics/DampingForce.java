package dev.coilwise.dynamics;

/**
 * Material damping: a dashpot of coefficient c = 2ζ·k_e/ω_1 beside elements 1..N (stiffness-proportional damping
 * tuned to the first fixed-fixed mode). The top element has no dashpot, so that it carries no force once the load
 * has left and contact stays a purely geometric event.
 */
final class DampingForce implements ForceTerm {
    private final LumpedChain chain;

    DampingForce(LumpedChain chain) {
        this.chain = chain;
    }

    @Override
    public void addForces(double[] y, double[] f) {
        int n = chain.masses();
        double c = chain.dampingCoefficient();
        double below = 0;
        for (int j = 1; j <= n; j++) {
            double v = y[n + j];
            TopFace.applyElementForce(j, c * (v - below), f);
            below = v;
        }
    }
}
