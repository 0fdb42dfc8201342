package dev.coilwise.testing;

/**
 * US customary units, for reproducing worked examples printed in them. Exact definitions: inch = 0.0254 m (1959
 * international yard and pound agreement), pound-force = 0.45359237 kg × 9.80665 m/s², psi = lbf/in².
 */
public final class Us {
    public static final double INCH = 0.0254;
    public static final double LBF = 0.45359237 * 9.80665;
    public static final double PSI = LBF / (INCH * INCH);
    public static final double KPSI = 1e3 * PSI;
    public static final double MPSI = 1e6 * PSI;
    /** lbf/in, N/m. */
    public static final double LBF_PER_INCH = LBF / INCH;
    /** Weight density lbf/in³ as mass density under standard gravity, kg/m³ per lbf/in³. */
    public static final double LB_PER_CUBIC_INCH = 0.45359237 / (INCH * INCH * INCH);

    private Us() {
    }
}
