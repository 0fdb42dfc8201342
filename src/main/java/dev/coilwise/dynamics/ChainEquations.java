package dev.coilwise.dynamics;

import java.util.List;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;

/**
 * Equations of motion of the chain and the load, m·a = Σ forces, as a first-order system of dimension 2N + 2
 * (layout in {@link TopFace}). While the load presses on the massless face it moves with it; otherwise it moves
 * under its own forces only. The forces of constant terms are added up once, at construction. Not thread-safe: one
 * instance per simulation.
 */
final class ChainEquations implements FirstOrderDifferentialEquations {
    private final LumpedChain chain;
    private final List<ForceTerm> terms;
    private final ForceTerm[] varying;
    private final double[] constant;
    private final double[] f;
    private final double perNodeMass;
    private final double perLoadMass;

    /** @param loadMass kg, 0 without a load (the load coordinates then stay still and never touch the face) */
    ChainEquations(LumpedChain chain, double loadMass, List<ForceTerm> terms) {
        this.chain = chain;
        this.terms = List.copyOf(terms);
        this.varying = terms.stream().filter(t -> !t.constant()).toArray(ForceTerm[]::new);
        this.f = new double[chain.masses() + 1];
        this.constant = new double[chain.masses() + 1];
        terms.stream().filter(ForceTerm::constant).forEach(t -> t.addForces(null, constant));
        this.perNodeMass = 1 / chain.nodeMass();
        this.perLoadMass = loadMass > 0 ? 1 / loadMass : 0;
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
        System.arraycopy(constant, 0, f, 0, n + 1);
        for (ForceTerm term : varying) {
            term.addForces(y, f);
        }
        for (int i = 0; i < n; i++) {
            yDot[n + 1 + i] = f[i] * perNodeMass;
        }
        yDot[2 * n + 1] = f[n] * perLoadMass;
    }
}
