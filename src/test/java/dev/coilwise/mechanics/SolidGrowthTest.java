package dev.coilwise.mechanics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Spring;
import dev.coilwise.testing.Printed;
import org.junit.jupiter.api.Test;

/** Growth of the outer diameter as the spring closes to solid. */
class SolidGrowthTest {
    private static final MaterialTable TABLE = MaterialTable.loadDefault();

    @Test
    void wireLengthOfOneTurnIsKept() {
        // Geometry: one active turn of the helix is a wire of length √((πD)² + p²) at free length and √((πD_s)² + d²)
        // at solid, with the same number of turns.
        for (EndType ends : EndType.values()) {
            for (double l0 : new double[] {60e-3, 90e-3, 150e-3}) {
                Spring s = new Spring(TABLE.get("chrome-silicon"), ends, 3e-3, 21e-3, 8.5, l0);
                double ds = SolidGrowth.outerDiameterAtSolid(s) - s.wireDiameter();
                double free = Math.hypot(Math.PI * s.meanDiameter(), s.pitch());
                double solid = Math.hypot(Math.PI * ds, s.wireDiameter());
                assertThat(solid).as("%s L0=%s", ends, l0).isCloseTo(free, within(1e-12));
            }
        }
    }

    @Test
    void handWorkedExample10_2Spring() {
        // Hand-worked for the Shigley 9th ed. Example 10-2 spring (d = 4 mm, D = 40 mm, Na = 11.6, plain, L0 = 80 mm):
        // p = (L0 − d)/Na = 6.5517 mm; OD_s = √(40² + (6.5517² − 4²)/π²) + 4 = 44.034 mm, against OD = 44 mm free.
        Spring s = new Spring(TABLE.get("oil-tempered"), EndType.PLAIN, 4e-3, 40e-3, 11.6, 80e-3);
        Printed.matches("p, mm", s.pitch() * 1e3, "6.5517");
        Printed.matches("OD at solid, mm", SolidGrowth.outerDiameterAtSolid(s) * 1e3, "44.034");
    }

    @Test
    void aNearlyClosedSpringDoesNotGrow() {
        Spring s = new Spring(TABLE.get("music-wire"), EndType.CLOSED_GROUND, 2e-3, 16e-3, 10, 24.0001e-3);
        assertThat(SolidGrowth.outerDiameterAtSolid(s)).isCloseTo(s.outerDiameter(), within(1e-9));
    }
}
