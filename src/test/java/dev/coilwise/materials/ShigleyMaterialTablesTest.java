package dev.coilwise.materials;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.testing.PublishedTable;
import dev.coilwise.testing.Us;
import java.math.BigDecimal;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * Validation of the bundled material table against the tables it cites: Budynas &amp; Nisbett, Shigley's Mechanical
 * Engineering Design, 9th ed., Tables 10-4, 10-5 and 10-6, stored verbatim (from memory) under
 * src/test/resources/dev/coilwise/materials. Rows are matched to materials by their ASTM number.
 */
class ShigleyMaterialTablesTest {
    private static final String T10_4 = "/dev/coilwise/materials/shigley-9e-table-10-4.txt";
    private static final String T10_5 = "/dev/coilwise/materials/shigley-9e-table-10-5.txt";
    private static final String T10_6 = "/dev/coilwise/materials/shigley-9e-table-10-6.txt";
    /** One GPa per Mpsi: 1e6 psi = 1e6 · 4.4482216 N / (0.0254 m)² (exact unit definitions). */
    private static final double GPA_PER_MPSI = Us.MPSI / 1e9;

    private final MaterialTable table = MaterialTable.loadDefault();

    private Material byStandard(String astm) {
        return table.all().stream().filter(m -> m.standard().equals("ASTM " + astm)).findFirst()
                .orElseThrow(() -> new AssertionError("no material for ASTM " + astm));
    }

    @Test
    void shigley9eTable10_4_constantsRangesAndCostsAreTheSiColumn() {
        List<List<String>> rows = PublishedTable.rows(T10_4);
        assertThat(rows).hasSize(11);
        Map<String, Integer> bandIndex = new java.util.HashMap<>();
        for (List<String> r : rows) {
            Material m = byStandard(r.get(1));
            int i = bandIndex.merge(r.get(1), 1, Integer::sum) - 1;
            StrengthBand b = m.strength().get(i);
            assertThat(b.exponent()).as("%s band %d m", m.key(), i).isEqualTo(Double.parseDouble(r.get(2)));
            assertThat(b.constantMpaMm()).as("%s band %d A", m.key(), i).isEqualTo(Double.parseDouble(r.get(6)));
            assertThat(b.minDiameter() * 1e3).as("%s band %d d_min", m.key(), i)
                    .isCloseTo(PublishedTable.low(r.get(5)), within(1e-12));
            assertThat(b.maxDiameter() * 1e3).as("%s band %d d_max", m.key(), i)
                    .isCloseTo(PublishedTable.high(r.get(5)), within(1e-12));
            if (i == 0) {
                // The printed cost of 302 stainless is the range 7.6-11; the table keeps its low end.
                assertThat(m.relativeCost()).as("%s relative cost", m.key()).isEqualTo(PublishedTable.low(r.get(7)));
            }
        }
        // Every band of every material comes from the table.
        bandIndex.forEach((astm, n) -> assertThat(byStandard(astm).strength()).hasSize(n));
        assertThat(bandIndex).hasSize(table.all().size());
    }

    @Test
    void shigley9eTable10_4_siFitAgreesWithTheKpsiColumnAtSeveralDiameters() {
        for (List<String> r : PublishedTable.rows(T10_4)) {
            Material mat = byStandard(r.get(1));
            double m = Double.parseDouble(r.get(2));
            double aUs = Double.parseDouble(r.get(4));
            double aSi = Double.parseDouble(r.get(6));
            // The two columns are rounded independently: half a unit of the last digit of each A, plus the
            // exponent's own rounding (±0.0005), which enters the unit conversion as 25.4^m.
            double tol = 0.5 / aUs + 0.5 / aSi + 0.0005 * Math.log(25.4);
            double lo = Math.max(PublishedTable.low(r.get(3)) * Us.INCH, PublishedTable.low(r.get(5)) * 1e-3);
            double hi = Math.min(PublishedTable.high(r.get(3)) * Us.INCH, PublishedTable.high(r.get(5)) * 1e-3);
            for (double d : new double[] {lo * 1.001, Math.sqrt(lo * hi), hi * 0.999}) {
                double kpsiFit = aUs / Math.pow(d / Us.INCH, m) * Us.KPSI;
                assertThat(mat.tensileStrength(d)).as("%s Sut at d = %.4f mm", mat.key(), d * 1e3)
                        .isCloseTo(kpsiFit, within(kpsiFit * tol));
            }
        }
    }

    @Test
    void shigley9eTable10_5_moduliByDiameterBand() {
        for (List<String> r : PublishedTable.rows(T10_5)) {
            Material mat = byStandard(r.get(1));
            double eGpa = Double.parseDouble(r.get(4));
            double gGpa = Double.parseDouble(r.get(6));
            // The Mpsi and GPa columns agree to their printed digits.
            assertThat(eGpa).isCloseTo(Double.parseDouble(r.get(3)) * GPA_PER_MPSI, within(halfUnit(r.get(4))
                    + halfUnit(r.get(3)) * GPA_PER_MPSI));
            assertThat(gGpa).isCloseTo(Double.parseDouble(r.get(5)) * GPA_PER_MPSI, within(halfUnit(r.get(6))
                    + halfUnit(r.get(5)) * GPA_PER_MPSI));
            for (double d : diametersIn(r.get(2), mat)) {
                assertThat(mat.youngsModulus(d) / 1e9).as("%s E at d = %.4f mm", mat.key(), d * 1e3)
                        .isCloseTo(eGpa, within(1e-9));
                assertThat(mat.shearModulus(d) / 1e9).as("%s G at d = %.4f mm", mat.key(), d * 1e3)
                        .isCloseTo(gGpa, within(1e-9));
            }
        }
    }

    /** Wire diameters, m, that the printed diameter cell covers: its ends and a point inside. */
    private static double[] diametersIn(String cell, Material mat) {
        if (cell.isEmpty()) {
            return new double[] {mat.minDiameter(), Math.sqrt(mat.minDiameter() * mat.maxDiameter()), mat.maxDiameter()};
        }
        if (cell.startsWith("<")) {
            double hi = Double.parseDouble(cell.substring(1)) * Us.INCH;
            return new double[] {mat.minDiameter(), 0.5 * (mat.minDiameter() + hi), hi};
        }
        if (cell.startsWith(">")) {
            double lo = Double.parseDouble(cell.substring(1)) * Us.INCH;
            return new double[] {lo * 1.0001, 0.5 * (lo + mat.maxDiameter()), mat.maxDiameter()};
        }
        double lo = PublishedTable.low(cell) * Us.INCH;
        double hi = PublishedTable.high(cell) * Us.INCH;
        return new double[] {lo, 0.5 * (lo + hi), hi};
    }

    private static double halfUnit(String printed) {
        return 0.5 * Math.pow(10, -new BigDecimal(printed).scale());
    }

    @Test
    void shigley9eTable10_6_staticAllowablesBeforeAndAfterSetRemoval() {
        // Which row of Table 10-6 each wire belongs to (common practice: A228 and A227 are cold-drawn carbon steel;
        // A229 is hardened and tempered carbon steel; A232 and A401 hardened and tempered low-alloy steel; A313 is
        // austenitic; B159 is a nonferrous alloy).
        Map<String, List<String>> members = Map.of(
                "Music wire and cold-drawn carbon steel", List.of("A228", "A227"),
                "Hardened and tempered carbon and low-alloy steel", List.of("A229", "A232", "A401"),
                "Austenitic stainless steels", List.of("A313"),
                "Nonferrous alloys", List.of("B159"));
        List<List<String>> rows = PublishedTable.rows(T10_6);
        assertThat(rows).hasSize(4);
        int covered = 0;
        for (List<String> r : rows) {
            double before = Double.parseDouble(r.get(1)) / 100;
            double afterLowEnd = PublishedTable.low(r.get(2)) / 100;
            for (String astm : members.get(r.get(0))) {
                Material m = byStandard(astm);
                assertThat(m.allowableStatic()).as("%s before set removal", m.key()).isEqualTo(before);
                assertThat(m.allowableSetRemoved()).as("%s after set removal", m.key()).isEqualTo(afterLowEnd);
                double d = Math.sqrt(m.minDiameter() * m.maxDiameter());
                assertThat(m.allowableStress(d, false)).isCloseTo(before * m.tensileStrength(d), within(1e-3));
                assertThat(m.allowableStress(d, true)).isCloseTo(afterLowEnd * m.tensileStrength(d), within(1e-3));
                covered++;
            }
        }
        assertThat(covered).isEqualTo(table.all().size());
    }
}
