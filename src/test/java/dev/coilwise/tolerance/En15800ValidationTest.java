package dev.coilwise.tolerance;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.materials.Material;
import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Spring;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Tolerances checked against EN 15800 and EN 10270-1 (sources named beside each check). */
class En15800ValidationTest {
    private static final Material MUSIC = MaterialTable.loadDefault().get("music-wire");
    /** Representative index in each column of the table: 4..8, over 8..14, over 14..20. */
    private static final double[] W_MID = {6, 11, 17};

    private static Spring spring(double dMm, double meanMm, double na, double l0Mm, EndType ends) {
        return new Spring(MUSIC, ends, dMm * 1e-3, meanMm * 1e-3, na, l0Mm * 1e-3);
    }

    /**
     * Every printed cell of EN 15800:2008 Table 1, stored verbatim in en15800-table1-coil-diameter.txt (transcribed
     * from the public reproductions named in its header; two independent reproductions agree). Each cell is hit with
     * a spring whose D is the geometric middle of the row and whose index is the middle of the column, and with a
     * spring whose D is exactly the row's upper bound ("up to and including").
     */
    @Test
    void coilDiameterMatchesEn15800Table1EveryPrintedCell() throws IOException {
        int checked = 0;
        for (double[] row : readTable()) {
            double lo = row[0];
            double hi = row[1];
            for (int g = 1; g <= 3; g++) {
                for (int c = 0; c < 3; c++) {
                    double printed = row[2 + 3 * (g - 1) + c];
                    if (Double.isNaN(printed)) {
                        continue;
                    }
                    for (double dm : new double[] {Math.sqrt(lo * hi), hi}) {
                        assertThat(En15800.coilDiameterTolerance(dm * 1e-3, W_MID[c], g) * 1e3)
                                .as("D %.3f mm, w %.0f, grade %d", dm, W_MID[c], g)
                                .isCloseTo(printed, within(1e-9));
                        checked++;
                    }
                }
            }
        }
        assertThat(checked).isEqualTo(2 * (12 * 9 + 5 * 3));
    }

    /** Column bounds of EN 15800 Table 1 are "4 to 8" and "over 8 to 14": w = 8 exactly takes the first column. */
    @Test
    void coilDiameterIndexEightFallsInTheFirstColumn() {
        // D = 20 mm, d = 2.5 mm, w = 8: row 16..25, grade 2 -> 0.35 (w 4..8), not 0.45 (w 8..14).
        Spring s = spring(2.5, 20, 6, 60, EndType.CLOSED_GROUND);
        assertThat(En15800.coilDiameterTolerance(s, 2) * 1e3).isCloseTo(0.35, within(1e-9));
    }

    /**
     * Wire diameter tolerance, EN 10270-1 diameter tolerance table (from memory): ±0.008 mm over 0.37 to 0.65 mm,
     * ±0.015 mm over 0.80 to 1.01 mm, ±0.025 mm over 1.78 to 2.78 mm, ±0.035 mm over 4.00 to 5.45 mm.
     */
    @Test
    void wireToleranceFollowsEn10270Part1() {
        assertThat(WireTolerance.halfWidth(0.5e-3) * 1e3).isCloseTo(0.008, within(1e-12));
        assertThat(WireTolerance.halfWidth(1.0e-3) * 1e3).isCloseTo(0.015, within(1e-12));
        assertThat(WireTolerance.halfWidth(2.0e-3) * 1e3).isCloseTo(0.025, within(1e-12));
        assertThat(WireTolerance.halfWidth(5.0e-3) * 1e3).isCloseTo(0.035, within(1e-12));
    }

    /**
     * Free length and force tolerance by the EN 15800 equations (from memory), worked by hand for music wire
     * d = 3 mm, D = 24 mm, n = 6, L0 = 60 mm, G = 81.0 GPa (material table, band 1.6..3.0 mm):
     * w = 8; φ_F = 65.92 · 3^3.3 / 24^1.6 · [−0.84·0.8³ + 3.781·0.8² − 4.244·0.8 + 2.274]
     *            = 65.92 · 37.540 / 161.54 · 0.86856 = 13.304 N;
     * k_F = 1/(3·64) + 0.54/8 + 0.803 = 0.87571;  φ_F·k_F = 11.650 N;
     * R = 81000 · 3⁴ / (8 · 24³ · 6) = 9.8877 N/mm;
     * A_L0 = φ_F·k_F·Q/R = 1.1783 mm (grade 2, Q = 1), 0.74231 mm (grade 1, Q = 0.63), 1.8852 mm (grade 3, Q = 1.6);
     * at L = 40 mm: F = 197.75 N, A_F = (11.650 + 0.015·197.75)·Q = 14.617 N (grade 2).
     */
    @Test
    void freeLengthAndForceFollowTheEn15800Equations() {
        Spring s = spring(3, 24, 6, 60, EndType.CLOSED_GROUND);
        assertThat(En15800.phiF(3, 24)).isCloseTo(13.304, within(0.001));
        assertThat(En15800.kF(8)).isCloseTo(0.87571, within(0.00001));
        assertThat(En15800.freeLengthTolerance(s, 2) * 1e3).isCloseTo(1.1783, within(0.0001));
        assertThat(En15800.freeLengthTolerance(s, 1) * 1e3).isCloseTo(0.74231, within(0.00001));
        assertThat(En15800.freeLengthTolerance(s, 3) * 1e3).isCloseTo(1.8852, within(0.0001));
        TestPoint p = En15800.testPoint(s, "F2", 0.040, 2);
        assertThat(p.force()).isCloseTo(197.75, within(0.01));
        assertThat(p.forceTolerance()).isCloseTo(14.617, within(0.001));
    }

    /**
     * Squareness e1 and parallelism e2 (EN 15800 / DIN 2095 grade angles, from memory): e1 = 0.052·L0 and
     * e2 = 0.03·De at grade 2; e1 = 0.026·L0 (about 1.5°) at grade 1, 0.087·L0 (about 5°) at grade 3.
     */
    @Test
    void squarenessAndParallelismFollowTheGradeAngles() {
        Spring s = spring(3, 24, 6, 60, EndType.CLOSED_GROUND);
        assertThat(En15800.squareness(s, 2) * 1e3).isCloseTo(3.12, within(1e-9));
        assertThat(En15800.parallelism(s, 2) * 1e3).isCloseTo(0.81, within(1e-9));
        assertThat(En15800.squareness(s, 1) * 1e3).isCloseTo(1.56, within(1e-9));
        assertThat(En15800.squareness(s, 3) * 1e3).isCloseTo(5.22, within(1e-9));
        // the grade shares are the tangents of the stated angles (printed to 2 significant digits)
        assertThat(Math.toDegrees(Math.atan(0.026))).isCloseTo(1.5, within(0.05));
        assertThat(Math.toDegrees(Math.atan(0.087))).isCloseTo(5.0, within(0.05));
    }

    private static List<double[]> readTable() throws IOException {
        List<double[]> rows = new ArrayList<>();
        try (InputStream in = En15800ValidationTest.class.getResourceAsStream("en15800-table1-coil-diameter.txt")) {
            String text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
            for (String line : text.split("\n")) {
                if (line.startsWith("#") || line.startsWith("D_over") || line.isBlank()) {
                    continue;
                }
                String[] f = line.trim().split("\\s+");
                double[] r = new double[f.length];
                for (int i = 0; i < f.length; i++) {
                    r[i] = f[i].equals("-") ? Double.NaN : Double.parseDouble(f[i]);
                }
                rows.add(r);
            }
        }
        return rows;
    }
}
