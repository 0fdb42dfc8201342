package dev.coilwise.tolerance;

import dev.coilwise.error.Check;

/**
 * Permissible deviation of the wire diameter, ±A_d.
 *
 * <p>Values: EN 10270-1 (patented cold-drawn unalloyed spring steel wire), diameter tolerance table, from memory.
 * coilwise applies this one table to every material of its material table as the reference wire tolerance; the wire
 * standard named for the material (e.g. ASTM A228) governs the order. EN 15800 itself defers the wire diameter to the
 * wire standard.
 */
public final class WireTolerance {
    /** Upper bound of each diameter band, mm (inclusive); the first band starts at 0.05 mm. */
    private static final double[] D_UPPER = {0.09, 0.17, 0.26, 0.37, 0.65, 0.80, 1.01, 1.78, 2.78, 4.00, 5.45, 7.10,
        9.00, 10.00, 11.10, 15.00, 20.00};
    /** ±tolerance of each band, mm (EN 10270-1, from memory). */
    private static final double[] TOL = {0.003, 0.004, 0.005, 0.006, 0.008, 0.010, 0.015, 0.020, 0.025, 0.030, 0.035,
        0.040, 0.045, 0.050, 0.070, 0.080, 0.090};
    /** Smallest and largest diameters the table covers, m. */
    public static final double MIN_DIAMETER = 0.05e-3;
    public static final double MAX_DIAMETER = 20e-3;

    private WireTolerance() {
    }

    /**
     * Half-width of the wire diameter tolerance, m. Diameters outside 0.05–20 mm use the nearest band.
     *
     * @param wireDiameter d, m
     */
    public static double halfWidth(double wireDiameter) {
        Check.positive("wire diameter", wireDiameter, "m");
        double dMm = wireDiameter * 1e3;
        for (int i = 0; i < D_UPPER.length; i++) {
            if (dMm <= D_UPPER[i] * (1 + 1e-12)) {
                return TOL[i] * 1e-3;
            }
        }
        return TOL[TOL.length - 1] * 1e-3;
    }

    /** Whether {@code wireDiameter} (m) lies inside the table. */
    public static boolean covers(double wireDiameter) {
        return wireDiameter >= MIN_DIAMETER * (1 - 1e-12) && wireDiameter <= MAX_DIAMETER * (1 + 1e-12);
    }
}
