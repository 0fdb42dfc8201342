package dev.coilwise.mechanics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.materials.Material;
import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Seating;
import dev.coilwise.model.Spring;
import dev.coilwise.testing.Printed;
import dev.coilwise.testing.Us;
import org.junit.jupiter.api.Test;

/** Buckling: the critical deflection and the absolute-stability length. */
class BucklingTest {
    private static final MaterialTable TABLE = MaterialTable.loadDefault();

    @Test
    void endConditionConstants() {
        // Shigley's MED 9th ed., Sec. 10-10 (from memory): α = 0.5 both ends on flat parallel surfaces, 0.707 one
        // flat and one pivoted, 1 both pivoted, 2 one end clamped and the other free.
        assertThat(Seating.FLAT_FLAT.alpha()).isEqualTo(0.5);
        assertThat(Seating.FLAT_PIVOT.alpha()).isEqualTo(0.707);
        assertThat(Seating.PIVOT_PIVOT.alpha()).isEqualTo(1.0);
        assertThat(Seating.FREE.alpha()).isEqualTo(2.0);
    }

    @Test
    void steelCoefficientIsTheGeneralStabilityLengthForSteel() {
        // Shigley's MED 9th ed., Eq. 10-13 (from memory): L0 < (πD/α)·√(2(E − G)/(2G + E)), which for steels gives
        // L0 < 2.63·D/α; steel constants from the same book's Table A-5: E = 207.0 GPa, G = 79.3 GPa.
        Printed.matches("coefficient", Buckling.stabilityLength(1, 207.0e9, 79.3e9, 1), "2.63");
        assertThat(Buckling.STEEL_STABILITY_COEFFICIENT).isEqualTo(2.63);
    }

    @Test
    void criticalDeflectionIsInfiniteExactlyBelowTheStabilityLength() {
        double e = 103.4e9;
        double g = 41.4e9;
        for (Seating s : Seating.values()) {
            double lcr = Buckling.stabilityLength(0.02, e, g, s.alpha());
            assertThat(Buckling.criticalDeflection(lcr * 0.999, 0.02, e, g, s.alpha())).isInfinite();
            double above = Buckling.criticalDeflection(lcr * 1.001, 0.02, e, g, s.alpha());
            // Just above it the root exists and is close to L0·C1' (the square root vanishes).
            assertThat(above).isFinite().isCloseTo(lcr * 1.001 * e / (2 * (e - g)), within(0.05 * lcr));
            double further = Buckling.criticalDeflection(lcr * 2, 0.02, e, g, s.alpha());
            assertThat(further / (lcr * 2)).isLessThan(above / (lcr * 1.001));
        }
    }

    @Test
    void handWorkedCriticalDeflection() {
        // Hand-worked with Shigley's Eqs. 10-10 to 10-12 for the Example 10-1 spring (E = 200 GPa, G = 81.7 GPa,
        // L0 = 2.06 in, D = 0.400 in, α = 0.5): λ = 2.575, C1' = 0.84531, C2' = 6.4260, y_cr = 1.4353 in.
        double ycr = Buckling.criticalDeflection(2.06 * Us.INCH, 0.400 * Us.INCH, 200e9, 81.7e9, 0.5);
        Printed.matches("y_cr, in", ycr / Us.INCH, "1.4353");
    }

    @Test
    void steelRuleComesFirstForSteelsOnly() {
        // Music wire over 0.125 in: E = 193 GPa, G = 80.0 GPa, so the general formula's stability length is
        // 2.51·D/α, shorter than the steel rule's 2.63·D/α. Between the two the steel rule (issue 2, Shigley
        // Eq. 10-13) declares the spring stable.
        Material music = TABLE.get("music-wire");
        double d = 4e-3;
        double dm = 40e-3;
        double general = Buckling.stabilityLength(dm, 193e9, 80e9, 0.5);
        assertThat(general / dm * 0.5).isCloseTo(2.51, within(0.005));
        double l0 = 0.5 * (general + Buckling.absoluteStabilityLength(dm, Seating.FLAT_FLAT));
        Spring between = new Spring(music, EndType.CLOSED_GROUND, d, dm, 10, l0);
        assertThat(Buckling.criticalDeflection(l0, dm, 193e9, 80e9, 0.5)).isFinite();
        assertThat(Buckling.criticalDeflection(between, Seating.FLAT_FLAT)).isInfinite();
        Spring longer = between.withFreeLength(Buckling.absoluteStabilityLength(dm, Seating.FLAT_FLAT) * 1.01);
        assertThat(Buckling.criticalDeflection(longer, Seating.FLAT_FLAT)).isFinite();

        // Phosphor bronze is not a steel: its own stability length, 2.56·D/α, decides, even where a steel of the
        // same proportions would pass the 2.63·D/α rule.
        Material bronze = TABLE.get("phosphor-bronze");
        double bronzeLength = Buckling.stabilityLength(dm, 103.4e9, 41.4e9, 0.5);
        assertThat(bronzeLength / dm * 0.5).isCloseTo(2.56, within(0.005));
        Spring shortBronze = new Spring(bronze, EndType.CLOSED_GROUND, d, dm, 10, bronzeLength * 0.99);
        assertThat(Buckling.criticalDeflection(shortBronze, Seating.FLAT_FLAT)).isInfinite();
        Spring bronzeAsLongAsSteel = shortBronze.withFreeLength(l0);
        assertThat(l0).isBetween(bronzeLength, Buckling.absoluteStabilityLength(dm, Seating.FLAT_FLAT));
        assertThat(Buckling.criticalDeflection(bronzeAsLongAsSteel, Seating.FLAT_FLAT)).isFinite();
    }
}
