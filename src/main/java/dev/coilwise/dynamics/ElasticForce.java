package dev.coilwise.dynamics;

/** The linear elements of the chain: element j pushes its two ends apart with k_e times its compression. */
final class ElasticForce implements ForceTerm {
    private final LumpedChain chain;
    private final TopFace face;

    ElasticForce(LumpedChain chain, TopFace face) {
        this.chain = chain;
        this.face = face;
    }

    @Override
    public void addForces(double[] y, double[] f) {
        double ke = chain.elementRate();
        double below = 0;
        for (int j = 1; j <= chain.masses(); j++) {
            double u = y[j - 1];
            TopFace.applyElementForce(j, ke * (u - below), f);
            below = u;
        }
        face.applyTopForce(ke * (face.position(y) - below), f);
    }
}
