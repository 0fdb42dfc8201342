package dev.coilwise.dynamics;

import dev.coilwise.error.Check;
import dev.coilwise.model.Spring;
import java.util.Arrays;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;

/**
 * The active coils of a spring as a chain of N equal point masses joined by N + 1 equal linear elements, the first
 * element fixed to the base. Each mass carries m_a/(N + 1) and each element has rate (N + 1)·k, so the elements in
 * series have the spring's rate k and the masses, with half an element's mass lumped at each end, the active mass
 * m_a; the half at the base rests on the seat and the half at the top is dropped (the top end face is massless).
 * The inactive end coils are not modelled.
 *
 * <p>Coordinates: u_i, m, is the displacement of mass i (1 = next to the base) towards the base from its place at
 * free length; element j (1..N+1) lies between node j − 1 and node j (node 0 the base, node N + 1 the top face)
 * and its compression is u_j − u_{j−1}, m.
 *
 * @param masses             N
 * @param nodeMass           m = m_a/(N + 1), kg
 * @param elementRate        k_e = (N + 1)·k, N/m
 * @param clashClosure       closure of one element at which its coils touch, (L0 − Ls)/(N + 1), m
 * @param clashRate          extra one-way rate of a closed element, {@value #CLASH_STIFFNESS_FACTOR}·k_e, N/m
 * @param dampingCoefficient c = 2ζ·k_e/ω_1 of each damped element (stiffness-proportional), N·s/m
 * @param axialGravity       component of gravity along the axis, towards the base, m/s² (may be negative)
 */
public record LumpedChain(int masses, double nodeMass, double elementRate, double clashClosure, double clashRate,
                          double dampingCoefficient, double axialGravity) {

    /** Ratio of the coil-contact rate of a clashed element to its own rate: 100 (coilwise's choice, see docs). */
    public static final double CLASH_STIFFNESS_FACTOR = 100;

    public LumpedChain {
        if (masses < 1) {
            throw new IllegalArgumentException("a chain needs at least one mass, got " + masses);
        }
        Check.positive("node mass", nodeMass, "kg");
        Check.positive("element rate", elementRate, "N/m");
        Check.positive("clash closure", clashClosure, "m");
        Check.nonNegative("clash rate", clashRate, "N/m");
        Check.nonNegative("damping coefficient", dampingCoefficient, "N*s/m");
        Check.finite("axial gravity", axialGravity);
    }

    /**
     * The chain of {@code spring} with {@code masses} masses.
     *
     * @param dampingRatio ζ of the first fixed-fixed mode; the dampers sit beside elements 1..N (see docs)
     * @param axialGravity g·sin(angle) towards the base, m/s²
     */
    public static LumpedChain of(Spring spring, int masses, double dampingRatio, double axialGravity) {
        int e = masses + 1;
        double ke = e * spring.rate();
        double m = spring.activeMass() / e;
        double w1 = 2 * Math.sqrt(ke / m) * Math.sin(Math.PI / (2.0 * e));
        return new LumpedChain(masses, m, ke, spring.deflectionToSolid() / e, CLASH_STIFFNESS_FACTOR * ke,
                2 * dampingRatio * ke / w1, axialGravity);
    }

    /** Number of elements, N + 1. */
    public int elements() {
        return masses + 1;
    }

    /** Rate of the whole chain, k_e/(N + 1), N/m. */
    public double rate() {
        return elementRate / elements();
    }

    /**
     * Angular frequency of mode j (1..N) of the chain with both ends fixed, from the eigenvalues of the tridiagonal
     * matrix tridiag(−1, 2, −1): ω_j = 2·√(k_e/m)·sin(jπ/(2(N + 1))), rad/s.
     */
    public double modeAngularFrequency(int j) {
        if (j < 1 || j > masses) {
            throw new IllegalArgumentException("mode number must lie between 1 and " + masses + ", got " + j);
        }
        return 2 * Math.sqrt(elementRate / nodeMass) * Math.sin(j * Math.PI / (2.0 * elements()));
    }

    /**
     * Natural frequencies of the chain with both ends fixed, Hz, ascending, computed numerically: the eigenvalues
     * of M⁻¹K by Commons Math {@link EigenDecomposition} (K tridiagonal, M = m·I).
     */
    public double[] naturalFrequencies() {
        int n = masses;
        RealMatrix a = MatrixUtils.createRealMatrix(n, n);
        double r = elementRate / nodeMass;
        for (int i = 0; i < n; i++) {
            a.setEntry(i, i, 2 * r);
            if (i > 0) {
                a.setEntry(i, i - 1, -r);
                a.setEntry(i - 1, i, -r);
            }
        }
        double[] lambda = new EigenDecomposition(a).getRealEigenvalues();
        double[] f = new double[n];
        for (int i = 0; i < n; i++) {
            f[i] = Math.sqrt(Math.max(0, lambda[i])) / (2 * Math.PI);
        }
        Arrays.sort(f);
        return f;
    }

    /**
     * Static positions of the masses, m, with the top face held at {@code top} (m towards the base from free length)
     * under the chain's own weight: u_i = top·i/(N + 1) + (m·g_a/(2k_e))·i·(N + 1 − i).
     */
    public double[] staticPositionsHeld(double top) {
        double[] u = new double[masses];
        double sag = nodeMass * axialGravity / (2 * elementRate);
        for (int i = 1; i <= masses; i++) {
            u[i - 1] = top * i / elements() + sag * i * (elements() - i);
        }
        return u;
    }

    /**
     * Static positions of the masses, m, with the top face free: element j carries the weight of the N − j + 1
     * masses above it and the top element carries nothing.
     */
    public double[] staticPositionsFree() {
        double[] u = new double[masses];
        double w = nodeMass * axialGravity / elementRate;
        double acc = 0;
        for (int j = 1; j <= masses; j++) {
            acc += (masses - j + 1) * w;
            u[j - 1] = acc;
        }
        return u;
    }

    /** The shortest period of the unclashed chain, 2π/ω_N, s. */
    public double shortestPeriod() {
        return 2 * Math.PI / modeAngularFrequency(masses);
    }
}
