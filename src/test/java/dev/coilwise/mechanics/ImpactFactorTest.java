package dev.coilwise.mechanics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.testing.Printed;
import org.junit.jupiter.api.Test;

/** Impact factor of a dropped weight, and the factor 2 of a suddenly applied load. */
class ImpactFactorTest {

    @Test
    void gereImpactLoadingWorkedExample() {
        // J. M. Gere, Mechanics of Materials, Sec. 2.8 "Impact loading", worked example of a sliding collar
        // (example number differs between editions; figures from memory): M = 20 kg dropped h = 150 mm onto the
        // flange of a vertical steel bar, L = 2.0 m, d = 15 mm, E = 210 GPa, g = 9.81 m/s².
        // Printed: δmax = 1.79 mm; impact factor δmax/δst = 169; σmax = E·δmax/L = 188 MPa.
        double weight = 20 * 9.81;
        double area = Math.PI * 0.015 * 0.015 / 4;
        double barRate = 210e9 * area / 2.0;
        double deltaSt = weight / barRate;
        double factor = ImpactFactor.of(0.150, deltaSt);
        Printed.matches("impact factor", factor, "169");
        Printed.matches("delta_max, mm", factor * deltaSt * 1e3, "1.79");
        Printed.matches("sigma_max, MPa", 210e9 * factor * deltaSt / 2.0 / 1e6, "188");

        // The same event through the arrest energy balance: the bar is a linear spring, the collar meets it at
        // √(2gh) and its weight keeps pushing.
        double x = ArrestBalance.maxCompression(barRate, 20, Math.sqrt(2 * 9.81 * 0.150), weight, 0);
        assertThat(x).isCloseTo(factor * deltaSt, within(1e-12 * x));
    }

    @Test
    void suddenlyAppliedLoadDoublesTheStaticDeflection() {
        // A load applied suddenly, with no drop, deflects a linear spring twice as far as the same load applied
        // slowly (common practice).
        assertThat(ImpactFactor.of(0, 3.7e-3)).isEqualTo(2.0);
        double k = 12_500;
        double force = 80;
        assertThat(ArrestBalance.maxCompression(k, 5, 0, force, 0)).isCloseTo(2 * force / k, within(1e-15));
        double peak = ArrestBalance.peakForce(k, 0, 2 * force / k);
        assertThat(peak).isCloseTo(2 * force, within(1e-12));
    }
}
