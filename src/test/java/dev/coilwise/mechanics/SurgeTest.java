package dev.coilwise.mechanics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Spring;
import dev.coilwise.testing.Printed;
import dev.coilwise.testing.Us;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.junit.jupiter.api.Test;

/** Natural frequencies and surge-wave stress of the spring itself. */
class SurgeTest {
    private static final MaterialTable TABLE = MaterialTable.loadDefault();
    // Shigley 9th ed. Example 10-2 spring (oil-tempered, d = 4 mm, D = 40 mm, 11.6 coils, plain, L0 = 80 mm).
    private final Spring spring = new Spring(TABLE.get("oil-tempered"), EndType.PLAIN, 4e-3, 40e-3, 11.6, 80e-3);

    /**
     * Lowest natural frequency, Hz, of the active coils cut into n equal segments (mass m_a/n at each joint, rate
     * n·k between joints), found with Commons Math's eigen-decomposition. Both ends fixed, or the far end free
     * (its joint then carries half a segment's mass).
     */
    static double chainFrequency(double k, double activeMass, int n, boolean farEndFree) {
        int dof = farEndFree ? n : n - 1;
        double segmentRate = n * k;
        double[] mass = new double[dof];
        java.util.Arrays.fill(mass, activeMass / n);
        if (farEndFree) {
            mass[dof - 1] = activeMass / (2 * n);
        }
        RealMatrix a = new Array2DRowRealMatrix(dof, dof);
        for (int i = 0; i < dof; i++) {
            boolean last = farEndFree && i == dof - 1;
            a.setEntry(i, i, (last ? 1 : 2) * segmentRate / mass[i]);
            if (i + 1 < dof) {
                double off = -segmentRate / Math.sqrt(mass[i] * mass[i + 1]); // symmetric form M^-½ K M^-½
                a.setEntry(i, i + 1, off);
                a.setEntry(i + 1, i, off);
            }
        }
        double[] eig = new EigenDecomposition(a).getRealEigenvalues();
        double lowest = java.util.Arrays.stream(eig).min().orElseThrow();
        return Math.sqrt(lowest) / (2 * Math.PI);
    }

    @Test
    void frequencyFormulasAreTheLowestModesOfTheDistributedSpring() {
        // f = ½√(k/m_a) with both ends fixed and ¼√(k/m_a) with one end free (Shigley's MED 9th ed., Sec. 10-9,
        // from memory): the limits of a finely cut chain of masses and springs. A 200-segment chain is within
        // (π/n)²/24 ≈ 1e-5 of the continuous spring.
        double k = spring.rate();
        double ma = spring.activeMass();
        assertThat(Surge.frequencyFixedFixed(spring)).isCloseTo(chainFrequency(k, ma, 200, false),
                within(1e-4 * Surge.frequencyFixedFixed(spring)));
        assertThat(Surge.frequencyFixedFree(spring)).isCloseTo(chainFrequency(k, ma, 200, true),
                within(1e-4 * Surge.frequencyFixedFree(spring)));
    }

    @Test
    void waveStressIsTheNominalStressOfTheWaveFront() {
        // Derivation (see Surge.waveStress): an end moved at speed v sends a wave of force v·√(k·m_a) through the
        // coils; its nominal torsional stress 8FD/(πd³) is v·√(2ρG) for every geometry.
        for (var m : TABLE.all()) {
            double d = Math.sqrt(m.minDiameter() * m.maxDiameter());
            for (double c : new double[] {4, 8, 14}) {
                Spring s = new Spring(m, EndType.CLOSED_GROUND, d, c * d, 9.5, 40 * d);
                double v = 3.2;
                double front = v * Math.sqrt(s.rate() * s.activeMass());
                double tau = Surge.waveStress(v, m.density(), s.shearModulus());
                assertThat(tau).as(m.key()).isCloseTo(Stress.nominal(front, s.meanDiameter(), d), within(1e-9 * tau));
                assertThat(Surge.speedLimit(tau, m.density(), s.shearModulus())).isCloseTo(v, within(1e-12));
            }
        }
    }

    @Test
    void waveStressPerUnitSpeedForSteel() {
        // Associated Spring, Design Handbook (Barnes Group), section on dynamic loading (from memory): for steel,
        // impact stress ≈ 131 psi per in/s of end speed. The handbook does not state its G and density; with
        // G = 11.5 Mpsi and 0.284 lbf/in³ the relation gives 130, so the tolerance is 1 %.
        double tau = Surge.waveStress(Us.INCH, 0.284 * Us.LB_PER_CUBIC_INCH, 11.5 * Us.MPSI) / Us.PSI;
        Printed.within("psi per in/s", tau, 131, 0.01);
    }
}
