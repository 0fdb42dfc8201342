package dev.coilwise.dynamics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.model.Spring;
import org.junit.jupiter.api.Test;

/** Natural frequencies of the lumped chain, computed by Commons Math's EigenDecomposition. */
class ChainModesTest {
    private static final Spring SPRING = Fixtures.spring();

    // Budynas & Nisbett, Shigley's Mechanical Engineering Design, 9th ed., Eq. (10-25) (from memory): the lowest
    // natural frequency of a helical spring between two flat plates is f = ½·√(k/m_a), m_a the active coil mass.
    // The 20-mass chain must be within 1 %.
    @Test
    void lowestFrequencyAtTwentyMassesMatchesShigleyEq10_25() {
        double f = LumpedChain.of(SPRING, 20, 0, 0).naturalFrequencies()[0];
        double expected = 0.5 * Math.sqrt(SPRING.rate() / SPRING.activeMass());
        assertThat(f).isCloseTo(expected, within(0.01 * expected));
    }

    // Eigenvalues of the second-difference matrix tridiag(−1, 2, −1) of order N are 2 − 2cos(jπ/(N + 1))
    // = 4 sin²(jπ/(2(N + 1))) (G. Strang, Computational Science and Engineering, 2007, Sec. 1.5, from memory), so
    // the fixed-fixed chain has ω_j = 2·√(k_e/m)·sin(jπ/(2(N + 1))). Numerical and closed form agree to round-off.
    @Test
    void everyModeMatchesTheSecondDifferenceEigenvaluesStrang() {
        for (int n : new int[]{2, 7, 20, 60}) {
            LumpedChain chain = LumpedChain.of(SPRING, n, 0, 0);
            double[] f = chain.naturalFrequencies();
            assertThat(f).hasSize(n);
            for (int j = 1; j <= n; j++) {
                double expected = 2 * Math.sqrt(chain.elementRate() / chain.nodeMass())
                        * Math.sin(j * Math.PI / (2.0 * (n + 1))) / (2 * Math.PI);
                assertThat(f[j - 1]).as("N = %d, mode %d", n, j).isCloseTo(expected, within(1e-10 * expected));
                assertThat(chain.modeAngularFrequency(j) / (2 * Math.PI)).isCloseTo(expected,
                        within(1e-12 * expected));
            }
        }
    }

    // The chain keeps the spring's rate and active mass: N + 1 elements of (N + 1)·k in series give k, and the
    // N masses plus the two half-masses at the ends give m_a (lumping as in the docs).
    @Test
    void chainKeepsRateAndActiveMass() {
        LumpedChain chain = LumpedChain.of(SPRING, 20, 0, 0);
        assertThat(chain.rate()).isCloseTo(SPRING.rate(), within(1e-12 * SPRING.rate()));
        assertThat(chain.nodeMass() * (chain.masses() + 1)).isCloseTo(SPRING.activeMass(),
                within(1e-12 * SPRING.activeMass()));
    }
}
