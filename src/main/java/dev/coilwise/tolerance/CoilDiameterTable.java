package dev.coilwise.tolerance;

/**
 * EN 15800:2008 Table 1, permissible deviation ±A_D of the coil diameter (applies alike to D, De and Di), mm, by mean
 * coil diameter D and spring index w = D/d, for grades 1, 2 and 3. The same table is DIN 2095:1973 Table 1 and appears
 * in DIN 2097 for extension springs.
 *
 * <p>Values read from two public reproductions of the table (spring makers' tolerance pages: blog.federnshop.com
 * "Toleranzen Druckfedern", industrial-springs.com "What tolerances does a standard compression spring have?" and,
 * for grade 2 above 63 mm, the same site's DIN 2097 page). The reproductions agree where they overlap. Grades 1 and 3
 * above D = 63 mm were not in the reproductions we could read: {@link #halfWidth} extrapolates them as 0.5× and 2×
 * grade 2 (the ratio of the printed rows from 31.5 to 63 mm) and reports that it did.
 *
 * <p>Rows run "over previous bound up to and including this bound"; the index columns are 4..8, over 8..14, over
 * 14..20.
 */
final class CoilDiameterTable {
    /** Upper bound of each D row, mm; the first row starts above 0.63 mm. */
    static final double[] D_UPPER = {1.0, 1.6, 2.5, 4.0, 6.3, 10, 16, 25, 31.5, 40, 50, 63, 80, 100, 125, 160, 200};
    /** Lower end of the table, mm. */
    static final double D_LOWER = 0.63;
    /** Upper bound of each index column. */
    static final double[] W_UPPER = {8, 14, 20};
    /** Lower end of the index columns. */
    static final double W_LOWER = 4;
    /** Last row (inclusive) of the printed grade 1 and grade 3 columns: D ≤ 63 mm. */
    static final int LAST_PRINTED_ROW_G13 = 11;
    /** Extrapolation factor of grade 1 against grade 2 above 63 mm (ours, see class comment). */
    static final double GRADE1_OVER_GRADE2 = 0.5;
    /** Extrapolation factor of grade 3 against grade 2 above 63 mm (ours, see class comment). */
    static final double GRADE3_OVER_GRADE2 = 2.0;

    private static final double N = Double.NaN;
    /** [row][grade-1][index column], mm; NaN where the reproduction did not print the value. */
    static final double[][][] A_D = {
        {{0.05, 0.07, 0.10}, {0.07, 0.10, 0.15}, {0.10, 0.15, 0.20}},   // 0.63 .. 1
        {{0.05, 0.07, 0.10}, {0.08, 0.10, 0.15}, {0.15, 0.20, 0.30}},   // 1 .. 1.6
        {{0.07, 0.10, 0.15}, {0.10, 0.15, 0.20}, {0.20, 0.30, 0.40}},   // 1.6 .. 2.5
        {{0.10, 0.10, 0.15}, {0.15, 0.20, 0.25}, {0.30, 0.40, 0.50}},   // 2.5 .. 4
        {{0.10, 0.15, 0.20}, {0.20, 0.25, 0.30}, {0.40, 0.50, 0.60}},   // 4 .. 6.3
        {{0.15, 0.15, 0.20}, {0.25, 0.30, 0.35}, {0.50, 0.60, 0.70}},   // 6.3 .. 10
        {{0.15, 0.20, 0.25}, {0.30, 0.35, 0.40}, {0.60, 0.70, 0.80}},   // 10 .. 16
        {{0.20, 0.25, 0.30}, {0.35, 0.45, 0.50}, {0.70, 0.90, 1.00}},   // 16 .. 25
        {{0.25, 0.30, 0.35}, {0.40, 0.50, 0.60}, {0.80, 1.00, 1.20}},   // 25 .. 31.5
        {{0.25, 0.30, 0.35}, {0.50, 0.60, 0.70}, {1.00, 1.20, 1.50}},   // 31.5 .. 40
        {{0.30, 0.40, 0.50}, {0.60, 0.80, 0.90}, {1.20, 1.50, 1.80}},   // 40 .. 50
        {{0.40, 0.50, 0.60}, {0.80, 1.00, 1.10}, {1.50, 2.00, 2.30}},   // 50 .. 63
        {{N, N, N}, {1.00, 1.20, 1.40}, {N, N, N}},                     // 63 .. 80
        {{N, N, N}, {1.20, 1.50, 1.70}, {N, N, N}},                     // 80 .. 100
        {{N, N, N}, {1.40, 1.90, 2.20}, {N, N, N}},                     // 100 .. 125
        {{N, N, N}, {1.80, 2.30, 2.70}, {N, N, N}},                     // 125 .. 160
        {{N, N, N}, {2.10, 2.90, 3.30}, {N, N, N}},                     // 160 .. 200
    };

    private CoilDiameterTable() {
    }

    /** Look-up result: the half-width in mm and whether it was clamped to the table or extrapolated. */
    record Entry(double halfWidthMm, boolean diameterClamped, boolean indexClamped, boolean extrapolated) {
    }

    /**
     * @param meanDiameterMm D, mm
     * @param index          w = D/d
     * @param grade          1, 2 or 3
     */
    static Entry halfWidth(double meanDiameterMm, double index, int grade) {
        int row = rowOf(meanDiameterMm);
        int col = columnOf(index);
        double v = A_D[row][grade - 1][col];
        boolean extrapolated = false;
        if (Double.isNaN(v)) {
            double g2 = A_D[row][1][col];
            v = grade == 1 ? GRADE1_OVER_GRADE2 * g2 : GRADE3_OVER_GRADE2 * g2;
            extrapolated = true;
        }
        boolean dClamped = meanDiameterMm < D_LOWER || meanDiameterMm > D_UPPER[D_UPPER.length - 1];
        boolean wClamped = index < W_LOWER || index > W_UPPER[W_UPPER.length - 1];
        return new Entry(v, dClamped, wClamped, extrapolated);
    }

    private static int rowOf(double dMm) {
        for (int i = 0; i < D_UPPER.length; i++) {
            if (dMm <= D_UPPER[i] * (1 + 1e-12)) {
                return i;
            }
        }
        return D_UPPER.length - 1;
    }

    private static int columnOf(double w) {
        for (int i = 0; i < W_UPPER.length; i++) {
            if (w <= W_UPPER[i] * (1 + 1e-12)) {
                return i;
            }
        }
        return W_UPPER.length - 1;
    }
}
