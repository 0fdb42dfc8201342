package dev.coilwise.mechanics;

import dev.coilwise.error.Check;
import dev.coilwise.materials.Material;

/**
 * Maximum allowable torsional stress of helical compression springs in cyclic service, as a fraction of S_ut, for
 * 10⁵, 10⁶ and 10⁷ cycles at stress ratio R = 0 (no surging, room temperature). Budynas &amp; Nisbett, Shigley's
 * Mechanical Engineering Design, 9th ed., Table 10-8 "Maximum allowable torsional stresses for helical compression
 * springs in cyclic applications" (from memory; the book credits Associated Spring, Barnes Group Inc.).
 *
 * <p>Between the printed lives the fraction is interpolated linearly in log₁₀ N. Below 10⁵ cycles the 10⁵ value
 * is held (no extrapolation, which would only raise it); beyond 10⁷ the 10⁷ value is held.
 */
public enum CyclicStressTable {
    /** ASTM A228 (music wire) and type 302 stainless: 36/33/30 % unpeened, 42/39/36 % peened. */
    A228_AND_302("ASTM A228 and type 302 stainless", new double[] {0.36, 0.33, 0.30}, new double[] {0.42, 0.39, 0.36}),
    /** ASTM A230 and A232 (oil-tempered valve-spring and chrome-vanadium wire): 42/40/38 % unpeened, 49/47/46 % peened. */
    A230_AND_A232("ASTM A230 and A232", new double[] {0.42, 0.40, 0.38}, new double[] {0.49, 0.47, 0.46});

    /** The lives of the table's rows: 10⁵, 10⁶, 10⁷ cycles. */
    public static final double[] LIVES = {1e5, 1e6, 1e7};

    private final String column;
    private final double[] unpeened;
    private final double[] peened;

    CyclicStressTable(String column, double[] unpeened, double[] peened) {
        this.column = column;
        this.unpeened = unpeened;
        this.peened = peened;
    }

    /** The column heading of the table this row set comes from. */
    public String column() {
        return column;
    }

    /**
     * Allowable maximum stress for a zero-to-maximum cycle, fraction of S_ut.
     *
     * @param cycles required life N (≥ 1)
     * @param shotPeened whether the wire is shot peened
     */
    public double fraction(double cycles, boolean shotPeened) {
        Check.positive("cycles", cycles, "cycles");
        double[] f = shotPeened ? peened : unpeened;
        double x = Math.log10(cycles);
        if (x <= 5) {
            return f[0];
        }
        if (x >= 7) {
            return f[2];
        }
        int i = x < 6 ? 0 : 1;
        double t = x - (5 + i);
        return f[i] + t * (f[i + 1] - f[i]);
    }

    /**
     * The column for a material. The table prints columns for A228/302 and for A230/A232 only; chrome-vanadium
     * (A232) takes its own column, and every other steel takes the lower A228/302 column: a cautious choice of
     * coilwise, not a published value.
     */
    public static CyclicStressTable forMaterial(Material material) {
        String std = material.standard() == null ? "" : material.standard();
        return std.contains("A232") || std.contains("A230") ? A230_AND_A232 : A228_AND_302;
    }
}
