package dev.coilwise.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import dev.coilwise.tolerance.TestPoint;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Content of the purchasing specification: fields, test loads and how L1, L2 are chosen. */
class SpecSheetTest {

    @Test
    void theBufferDesignIsFeasibleSoTheSheetCarriesNoWarningNote() {
        Evaluation e = SpecSheets.evaluate(SpecSheets.buffer(), SpecSheets.bufferRequirement());
        assertThat(e.violations()).isEmpty();
        assertThat(SpecSheets.bufferSheet().notes()).noneMatch(n -> n.contains("does not meet"));
    }

    @Test
    void everyRequiredFieldIsPresent() {
        for (SpecSheet sheet : List.of(SpecSheets.bufferSheet(), SpecSheets.launcherSheet())) {
            for (String key : SpecSheet.REQUIRED_KEYS) {
                assertThat(sheet.field(key)).as(key).isPresent();
            }
            assertThat(sheet.caution()).isEqualTo(Caution.TEXT);
        }
    }

    /**
     * Buffer sheet values, worked by hand: wire 3 mm ± 0.030 mm (EN 10270-1 band 2.78..4.00 mm, from memory);
     * De = 27 mm and Di = 21 mm ± 0.350 mm (EN 15800 Table 1, D = 24 mm in row 16..25 mm, w = 8 in column 4..8,
     * grade 2); Lc max = 8 coils × 3.03 mm = 24.24 mm (closed and ground, Nt = Na + 2).
     * R = 81000 · 3⁴ / (8 · 24³ · 6) = 9.8877 N/mm (Shigley's MED 9th ed., Eq. 10-9). L1 is the installed length
     * (50 mm pocket): F1 = 9.8877 × 10 = 98.9 N; A_F1 = 11.650 + 0.015 × 98.877 = 13.13 N (EN 15800 equation, from
     * memory; φ_F·k_F = 11.650 N worked in En15800ValidationTest).
     */
    @Test
    void bufferFieldsMatchTheHandWorkedValues() {
        SpecSheet s = SpecSheets.bufferSheet();
        assertThat(value(s, "material")).isEqualTo("Music wire to ASTM A228");
        assertThat(value(s, "wire_diameter")).startsWith("3.00 mm ± 0.030 mm");
        assertThat(value(s, "outer_diameter")).isEqualTo("27.00 mm ± 0.350 mm");
        assertThat(value(s, "inner_diameter")).isEqualTo("21.00 mm ± 0.350 mm");
        assertThat(value(s, "guide")).startsWith("works in a bore of 32.00 mm");
        assertThat(value(s, "free_length")).startsWith("60.00 mm ± 1.178 mm");
        assertThat(value(s, "active_coils")).isEqualTo("6");
        assertThat(value(s, "total_coils")).startsWith("8");
        assertThat(value(s, "ends")).isEqualTo("closed (squared) and ground");
        assertThat(value(s, "helix")).isEqualTo("right-hand, optional (not specified)");
        assertThat(value(s, "solid_length_max")).isEqualTo("max 24.24 mm");
        assertThat(value(s, "F1")).isEqualTo("98.9 N ± 13.1 N at L1 = 50.00 mm (installed length)");
        assertThat(value(s, "rate")).startsWith("9.89 N/mm ±");
        assertThat(value(s, "cycles")).isEqualTo("100,000 load cycles between L1 and L2");
        assertThat(value(s, "set_removal")).startsWith("required");
        assertThat(value(s, "shot_peening")).isEqualTo("required");
        assertThat(value(s, "quantity")).isEqualTo("500 pieces");
        assertThat(value(s, "tolerance_grade")).startsWith("EN 15800 grade 2 (medium)");
        assertThat(s.testPoints().get(0).forceTolerance()).isCloseTo(13.133, within(0.001));
    }

    @Test
    void f2IsAtTheWorkingMaximumOfTheArrest() {
        Spring sp = SpecSheets.buffer();
        Evaluation e = SpecSheets.evaluate(sp, SpecSheets.bufferRequirement());
        TestPoint f2 = SpecSheets.bufferSheet().testPoints().get(1);
        assertThat(f2.name()).isEqualTo("F2");
        assertThat(f2.length()).isCloseTo(sp.freeLength() - e.totalDeflection(), within(1e-12));
        assertThat(f2.force()).isCloseTo(e.peakForce(), within(1e-9 * e.peakForce()));
    }

    @Test
    void withoutPreloadF1SitsAtThirtyPercentOfTheTravel() {
        Spring sp = SpecSheets.buffer();
        Requirement r = SpecSheets.arrestWithoutPocket(2.0, 1.5, 0.040);
        Evaluation e = SpecSheets.evaluate(sp, r);
        List<TestPoint> pts = TestLoads.of(e, 2);
        assertThat(pts.get(0).deflection()).isCloseTo(0.3 * e.totalDeflection(), within(1e-12));
        assertThat(TestLoads.l1IsInstalledLength(e)).isFalse();
    }

    @Test
    void theLauncherSheetIsInInchesWithTheCockedLengthAsL2() {
        SpecSheet s = SpecSheets.launcherSheet();
        Evaluation e = SpecSheets.evaluate(SpecSheets.launcher(), SpecSheets.launcherRequirement());
        assertThat(value(s, "wire_diameter")).startsWith("0.055 in");
        assertThat(value(s, "F2")).contains("lbf").contains("working maximum: cocked");
        assertThat(s.testPoints().get(1).deflection()).isCloseTo(e.workingDeflection(), within(1e-12));
        assertThat(value(s, "helix")).isEqualTo("left-hand (required)");
        assertThat(value(s, "surface")).isEqualTo("zinc phosphate and oil");
        assertThat(value(s, "tolerance_grade")).startsWith("EN 15800 grade 3 (coarse)");
        assertThat(value(s, "guide")).startsWith("works over a rod of 0.300 in");
        assertThat(s.fields()).noneMatch(f -> f.key().equals("squareness")); // closed, not ground
    }

    @Test
    void anInfeasibleDesignIsSaidToBeSo() {
        Spring sp = SpecSheets.buffer();
        Requirement r = SpecSheets.arrestWithoutPocket(20.0, 3.0, 0.010);
        SpecSheet s = SpecSheet.build(sp, SpecSheets.evaluate(sp, r), r, 2, 10);
        assertThat(s.notes()).anyMatch(n -> n.startsWith("This design does not meet every limit"));
    }

    private static String value(SpecSheet s, String key) {
        return s.field(key).orElseThrow().value();
    }
}
