package dev.coilwise.dynamics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.model.Spring;
import org.junit.jupiter.api.Test;

/** A load set on the spring and let go (drop height zero). */
class SuddenLoadTest {
    // A suddenly applied load deflects a linear spring twice as far as the same load applied slowly (common
    // practice; Gere & Goodno, Mechanics of Materials, Sec. 2.8, impact factor 1 + √(1 + 2h/δ_st) = 2 at h = 0,
    // from memory). Near-massless spring (density / 100), tolerance 0.5 %.
    @Test
    void peakDeflectionIsTwiceTheStaticOneGereImpactLoading() {
        Spring s = Fixtures.spring(Fixtures.withDensityScaled(Fixtures.musicWire(), 1e-2));
        double m = 2;
        double staticDeflection = m * 9.80665 / s.rate();
        SimulationSummary sum = Simulator.simulate(s, Fixtures.arrest(m, 0, Math.PI / 2, 0),
                SimulationOptions.defaults()).summary();
        assertThat(sum.maxCompression()).isCloseTo(2 * staticDeflection, within(0.005 * 2 * staticDeflection));
        assertThat(sum.peakForce()).isCloseTo(2 * m * 9.80665, within(0.005 * 2 * m * 9.80665));
    }
}
