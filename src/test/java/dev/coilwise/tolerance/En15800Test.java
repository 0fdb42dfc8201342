package dev.coilwise.tolerance;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.error.BadInputException;
import dev.coilwise.materials.Material;
import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Spring;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.junit.jupiter.api.Test;

/** Behaviour of the tolerance API: grades, scope notes, bad input. */
class En15800Test {
    private static final Material MUSIC = MaterialTable.loadDefault().get("music-wire");

    private static Spring spring(double dMm, double meanMm, double na, double l0Mm, EndType ends) {
        return new Spring(MUSIC, ends, dMm * 1e-3, meanMm * 1e-3, na, l0Mm * 1e-3);
    }

    /** A finer grade is never looser than a coarser one (the ordering of EN 15800's grades). */
    @Property(tries = 200)
    void finerGradesAreNeverLooser(@ForAll @DoubleRange(min = 0.3, max = 6.5) double dMm,
                                   @ForAll @DoubleRange(min = 4, max = 20) double w,
                                   @ForAll @DoubleRange(min = 2, max = 30) double na) {
        Spring s = spring(dMm, dMm * w, na, dMm * (na + 2) * 2.5, EndType.CLOSED_GROUND);
        SpringTolerances t1 = En15800.of(s, 1);
        SpringTolerances t2 = En15800.of(s, 2);
        SpringTolerances t3 = En15800.of(s, 3);
        assertThat(t1.meanDiameter()).isLessThanOrEqualTo(t2.meanDiameter());
        assertThat(t2.meanDiameter()).isLessThanOrEqualTo(t3.meanDiameter());
        assertThat(t1.freeLength()).isLessThan(t2.freeLength());
        assertThat(t2.freeLength()).isLessThan(t3.freeLength());
        assertThat(t1.squareness()).isLessThan(t2.squareness());
        assertThat(t2.rate()).isLessThanOrEqualTo(t3.rate());
    }

    @Test
    void aSpringInsideTheScopeHasNoNotes() {
        SpringTolerances t = En15800.of(spring(2, 16, 8, 50, EndType.CLOSED_GROUND), 2);
        assertThat(t.notes()).isEmpty();
        assertThat(t.withinStandard()).isTrue();
        assertThat(t.outerDiameter()).isEqualTo(t.meanDiameter());
        assertThat(t.activeCoils()).isEqualTo(0.25);
    }

    @Test
    void anIndexAboveTwentyIsNotedAndUsesTheLastColumn() {
        // D = 25 mm, d = 1 mm, w = 25: outside scope; grade 2 row 16..25, last column -> 0.50 mm
        SpringTolerances t = En15800.of(spring(1, 25, 8, 60, EndType.CLOSED_GROUND), 2);
        assertThat(t.meanDiameter() * 1e3).isCloseTo(0.50, within(1e-9));
        assertThat(t.notes()).anySatisfy(n -> assertThat(n).contains("spring index").contains("EN 15800 scope"));
    }

    @Test
    void gradeOneAboveSixtyThreeMillimetresIsExtrapolatedAndSaysSo() {
        // D = 70 mm, w = 10: grade 2 printed 1.20 mm; grade 1 extrapolated as 0.60 mm
        Spring s = new Spring(MaterialTable.loadDefault().get("oil-tempered"), EndType.CLOSED_GROUND, 7e-3, 70e-3, 6,
                150e-3);
        SpringTolerances t = En15800.of(s, 1);
        assertThat(t.meanDiameter() * 1e3).isCloseTo(0.60, within(1e-9));
        assertThat(t.notes()).anySatisfy(n -> assertThat(n).contains("extrapolated"));
        assertThat(En15800.of(s, 2).notes()).isEmpty();
    }

    @Test
    void ungroundEndsHaveNoSquarenessOrParallelism() {
        SpringTolerances t = En15800.of(spring(2, 16, 8, 50, EndType.CLOSED), 2);
        assertThat(t.squareness()).isNaN();
        assertThat(t.parallelism()).isNaN();
    }

    @Test
    void geometricRateScatterIsTheFirstOrderSumOfTheDimensionalTolerances() {
        Spring s = spring(2, 16, 8, 50, EndType.CLOSED_GROUND);
        SpringTolerances t = En15800.of(s, 2);
        double rel = 4 * t.wireDiameter() / s.wireDiameter() + 3 * t.meanDiameter() / s.meanDiameter()
                + t.activeCoils() / s.activeCoils();
        assertThat(t.rate()).isCloseTo(rel * s.rate(), within(1e-9 * s.rate()));
        // and it is consistent with a finite difference of R = G d^4 / (8 D^3 n) (small-perturbation check)
        double h = 1e-6;
        Spring up = new Spring(MUSIC, s.ends(), s.wireDiameter() * (1 + h), s.meanDiameter(), s.activeCoils(), s.freeLength());
        assertThat((up.rate() / s.rate() - 1) / h).isCloseTo(4, within(1e-4));
    }

    @Test
    void rateToleranceFromTwoTestForcesIsTheirSumOverTheTravel() {
        Spring s = spring(3, 24, 6, 60, EndType.CLOSED_GROUND);
        double a1 = En15800.testPoint(s, "F1", 0.050, 2).forceTolerance();
        double a2 = En15800.testPoint(s, "F2", 0.040, 2).forceTolerance();
        assertThat(En15800.rateTolerance(s, 0.050, 0.040, 2)).isCloseTo((a1 + a2) / 0.010, within(1e-9));
    }

    @Test
    void maxSolidLengthUsesTheLargestWire() {
        Spring s = spring(2, 16, 8, 50, EndType.CLOSED_GROUND);
        // closed-ground: Ls = d * Nt, Nt = 10, d_max = 2.025 mm (EN 10270-1, from memory)
        assertThat(En15800.maxSolidLength(s) * 1e3).isCloseTo(20.25, within(1e-9));
    }

    @Test
    void gradeFourIsRejectedWithTheAllowedGrades() {
        Spring s = spring(2, 16, 8, 50, EndType.CLOSED_GROUND);
        assertThatThrownBy(() -> En15800.of(s, 4)).isInstanceOf(BadInputException.class)
                .hasMessageContaining("tolerance grade").hasMessageContaining("'4'").hasMessageContaining("1 (fine)");
    }

    @Test
    void aTestLengthBeyondSolidIsRejected() {
        Spring s = spring(2, 16, 8, 50, EndType.CLOSED_GROUND);
        assertThatThrownBy(() -> En15800.testPoint(s, "F2", 0.010, 2)).isInstanceOf(BadInputException.class)
                .hasMessageContaining("test deflection");
    }
}
