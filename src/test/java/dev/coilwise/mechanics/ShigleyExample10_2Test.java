package dev.coilwise.mechanics;

import static org.assertj.core.api.Assertions.assertThat;

import dev.coilwise.materials.Material;
import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Spring;
import dev.coilwise.testing.Printed;
import org.junit.jupiter.api.Test;

/**
 * Budynas &amp; Nisbett, Shigley's Mechanical Engineering Design, 9th ed., Example 10-2 (from memory): an
 * oil-tempered wire spring, d = 4 mm, C = 10, plain ends, free length 80 mm, 50 N should deflect it 15 mm; find
 * the rate, the outside diameter, the coils, the solid length and the static factor of safety at solid. SI units.
 */
class ShigleyExample10_2Test {
    private static final double D_WIRE = 4e-3;
    private static final double D_MEAN = 10 * D_WIRE;
    private static final double L0 = 80e-3;
    private final Material oilTempered = MaterialTable.loadDefault().get("oil-tempered");

    @Test
    void activeCoilsForTheRequiredRate() {
        // Printed: k = 50/15 = 3.33 N/mm; D = Cd = 40 mm; OD = 44 mm; G = 77.2 GPa; Na = d⁴G/(8D³k) = 11.6 turns.
        double k = 50.0 / 15e-3;
        Spring oneCoil = new Spring(oilTempered, EndType.PLAIN, D_WIRE, D_MEAN, 1, L0);
        Printed.matches("G, GPa", oneCoil.shearModulus() / 1e9, "77.2");
        Printed.matches("OD, mm", oneCoil.outerDiameter() * 1e3, "44");
        Printed.matches("Na", oneCoil.rate() / k, "11.6");
    }

    @Test
    void solidLengthAndFactorOfSafetyAtSolid() {
        // Printed: Nt = Na = 11.6 (plain); Ls = d(Nt + 1) = 50.4 mm; Sut = 1855/4^0.187 = 1431 MPa;
        // Ssy = 0.50 Sut = 716 MPa; ys = L0 − Ls = 29.6 mm; K_B = 1.135; ns = Ssy/τs = 4.02.
        Spring s = new Spring(oilTempered, EndType.PLAIN, D_WIRE, D_MEAN, 11.6, L0);
        assertThat(s.totalCoils()).isEqualTo(11.6);
        Printed.matches("Ls, mm", s.solidLength() * 1e3, "50.4");
        Printed.matches("Sut, MPa", s.tensileStrength() / 1e6, "1431");
        Printed.matches("Ssy, MPa", oilTempered.allowableStress(D_WIRE, false) / 1e6, "716");
        Printed.matches("ys, mm", s.deflectionToSolid() * 1e3, "29.6");
        Printed.matches("K_B", CurvatureFactors.bergstrasser(s.index()), "1.135");
        double tauSolid = Stress.corrected(s.forceAt(s.deflectionToSolid()), D_MEAN, D_WIRE);
        Printed.matches("ns", oilTempered.allowableStress(D_WIRE, false) / tauSolid, "4.02");
    }
}
