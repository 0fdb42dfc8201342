package dev.coilwise.dynamics;

import java.util.Arrays;
import java.util.List;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;

/**
 * Equations of motion of the chain and the load, m·a = Σ forces, as a first-order system of dimension 2N + 2
 * (layout in {@link TopFace}). While the load presses on the massless face it moves with it; otherwise it moves
 * under its own forces only. Not thread-safe: one instance per simulation.
 */
final class ChainEquations implements FirstOrderDifferentialEquations {
    private final LumpedChain chain;
    private final double loadMass;
    private final List<ForceTerm> terms;
    private final ForceTerm[] termArray;
    private final double[] f;

    /** @param loadMass kg, 0 without a load (the load coordinates then stay still and never touch the face) */
    ChainEquations(LumpedChain chain, double loadMass, List<ForceTerm> terms) {
        this.chain = chain;
        this.loadMass = loadMass;
        this.terms = List.copyOf(terms);
        this.termArray = terms.toArray(new ForceTerm[0]);
        this.f = new double[chain.masses() + 1];
    }

    List<ForceTerm> terms() {
        return terms;
    }

    @Override
    public int getDimension() {
        return 2 * chain.masses() + 2;
    }

    @Override
    public void computeDerivatives(double t, double[] y, double[] yDot) {
        int n = chain.masses();
        System.arraycopy(y, n + 1, yDot, 0, n + 1);
        Arrays.fill(f, 0);
        for (ForceTerm term : termArray) {
            term.addForces(y, f);
        }
        double m = chain.nodeMass();
        for (int i = 0; i < n; i++) {
            yDot[n + 1 + i] = f[i] / m;
        }
        yDot[2 * n + 1] = loadMass > 0 ? f[n] / loadMass : 0;
    }
}
