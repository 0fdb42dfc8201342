package dev.coilwise.mechanics;

import static org.assertj.core.api.Assertions.assertThat;

import dev.coilwise.materials.Material;
import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Seating;
import dev.coilwise.model.Spring;
import dev.coilwise.testing.Printed;
import dev.coilwise.testing.Us;
import org.junit.jupiter.api.Test;

/**
 * Budynas &amp; Nisbett, Shigley's Mechanical Engineering Design, 9th ed., Example 10-1 (from memory): a helical
 * compression spring of no. 16 music wire (d = 0.037 in), outside diameter 7/16 in, squared (closed, not ground)
 * ends, 12½ total turns. The book carries rounded figures from step to step; each step here starts from the
 * figures the book printed before it, so every result can be held to the digits printed.
 */
class ShigleyExample10_1Test {
    private static final double D_WIRE = 0.037 * Us.INCH;
    // Book: D = OD − d = 7/16 − 0.037 = 0.400 in (printed to three decimals).
    private static final double D_MEAN = 0.400 * Us.INCH;
    // Book: Na = Nt − 2 = 12.5 − 2 = 10.5; L0 = 2.06 in, chosen in part (f).
    private static final double NA = 10.5;
    private static final double L0 = 2.06 * Us.INCH;

    private final Material musicWire = MaterialTable.loadDefault().get("music-wire");
    private final Spring spring = new Spring(musicWire, EndType.CLOSED, D_WIRE, D_MEAN, NA, L0);

    @Test
    void partA_tensileAndTorsionalYieldStrength() {
        // Printed: Sut = 201/0.037^0.145 = 324 kpsi; Ssy = 0.45 Sut = 146 kpsi (Table 10-6).
        Printed.matches("Sut, kpsi", spring.tensileStrength() / Us.KPSI, "324");
        Printed.matches("Ssy, kpsi", musicWire.allowableStress(D_WIRE, false) / Us.KPSI, "146");
    }

    @Test
    void partB_indexBergstrasserFactorAndLoadAtYield() {
        // Printed: D = 0.400 in, C = 10.8, K_B = 1.124, F = π d³ Ssy/(8 K_B D) = 6.46 lbf with Ssy = 146 kpsi.
        Printed.matches("OD, in", spring.outerDiameter() / Us.INCH, "0.437");
        Printed.matches("C", spring.index(), "10.8");
        Printed.matches("K_B", CurvatureFactors.bergstrasser(spring.index()), "1.124");
        Printed.matches("F at yield, lbf", Stress.forceFor(146 * Us.KPSI, D_MEAN, D_WIRE) / Us.LBF, "6.46");
    }

    @Test
    void partC_rate() {
        // Printed: G = 11.85 Mpsi (Table 10-5), k = d⁴G/(8D³Na) = 4.13 lbf/in.
        Printed.matches("G, Mpsi", spring.shearModulus() / Us.MPSI, "11.85");
        Printed.matches("k, lbf/in", spring.rate() / Us.LBF_PER_INCH, "4.13");
    }

    @Test
    void partsDtoF_deflectionSolidLengthAndFreeLength() {
        // Printed: y = F/k = 6.46/4.13 = 1.56 in; Ls = (Nt + 1)d = 0.500 in; L0 = y + Ls = 2.06 in.
        Printed.matches("y at 6.46 lbf, in", 6.46 * Us.LBF / spring.rate() / Us.INCH, "1.56");
        assertThat(spring.totalCoils()).isEqualTo(12.5);
        Printed.matches("Ls, in", spring.solidLength() / Us.INCH, "0.500");
        Printed.matches("L0 - Ls, in", spring.deflectionToSolid() / Us.INCH, "1.56");
    }

    @Test
    void partG_absoluteStability() {
        // Printed: L0 < 2.63 D/α = 2.63(0.400)/0.5 = 2.10 in with α = 0.5; 2.06 in is (narrowly) stable.
        Printed.matches("2.63 D/alpha, in", Buckling.absoluteStabilityLength(D_MEAN, Seating.FLAT_FLAT) / Us.INCH,
                "2.10");
        assertThat(Buckling.criticalDeflection(spring, Seating.FLAT_FLAT)).isInfinite();
    }

    @Test
    void partH_pitch() {
        // Printed: p = (L0 − 3d)/Na = (2.06 − 3(0.037))/10.5 = 0.186 in.
        Printed.matches("p, in", spring.pitch() / Us.INCH, "0.186");
    }
}
