package dev.coilwise.dynamics;

/** The linear elements of the chain: element j pushes its two ends apart with k_e times its compression. */
final class ElasticForce implements ForceTerm {
    private final LumpedChain chain;
    private final TopFace face;

    ElasticForce(LumpedChain chain, TopFace face) {
        this.chain = chain;
        this.face = face;
    }

    /**
     * Mass i feels k_e·(u_{i+1} − 2u_i + u_{i−1}) from the elements below and above it (u_0 = 0 at the base); the top
     * mass's upper element reaches the face, whose force the face also passes to the load.
     */
    @Override
    public void addForces(double[] y, double[] f) {
        double ke = chain.elementRate();
        int n = chain.masses();
        double below = 0;
        double u = y[0];
        for (int i = 0; i < n - 1; i++) {
            double above = y[i + 1];
            f[i] += ke * (above - 2 * u + below);
            below = u;
            u = above;
        }
        f[n - 1] -= ke * (u - below);
        face.applyTopForce(ke * (face.position(y) - u), f);
    }
}
