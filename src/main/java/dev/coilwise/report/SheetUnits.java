package dev.coilwise.report;

import dev.coilwise.model.UnitSystem;
import java.util.Locale;

/**
 * Formats SI values for people, in the unit system the requirement was written in: mm, N, N/mm, MPa, kg or in, lbf,
 * lbf/in, psi, lb. Exact factors: 1 in = 25.4 mm; 1 lbf = 4.4482216152605 N; 1 lb = 0.45359237 kg.
 */
public final class SheetUnits {
    private static final double LBF = 0.45359237 * 9.80665;
    private final UnitSystem system;

    public SheetUnits(UnitSystem system) {
        this.system = system;
    }

    public boolean metric() {
        return system == UnitSystem.SI;
    }

    public String lengthUnit() {
        return metric() ? "mm" : "in";
    }

    public String forceUnit() {
        return metric() ? "N" : "lbf";
    }

    /** Length in display units (number only). */
    public double lengthValue(double m) {
        return metric() ? m * 1e3 : m / 0.0254;
    }

    /** Force in display units (number only). */
    public double forceValue(double n) {
        return metric() ? n : n / LBF;
    }

    /** e.g. {@code 22.00 mm} or {@code 0.866 in}. */
    public String len(double m) {
        return metric() ? fmt("%.2f mm", m * 1e3) : fmt("%.3f in", m / 0.0254);
    }

    /** A length tolerance, e.g. {@code ± 0.450 mm} or {@code ± 0.0177 in}. */
    public String tol(double m) {
        return "± " + (metric() ? fmt("%.3f mm", m * 1e3) : fmt("%.4f in", m / 0.0254));
    }

    /** e.g. {@code 12.7 N} (three significant digits at least, one decimal at most above 100). */
    public String force(double n, boolean sign) {
        double v = forceValue(n);
        return (sign ? "± " : "") + sig(v) + " " + forceUnit();
    }

    public String force(double n) {
        return force(n, false);
    }

    /** e.g. {@code 2.53 N/mm} or {@code 14.5 lbf/in}. */
    public String rate(double nPerM) {
        return metric() ? sig(nPerM * 1e-3) + " N/mm" : sig(nPerM * 0.0254 / LBF) + " lbf/in";
    }

    /** e.g. {@code 512 MPa} or {@code 74,300 psi} (psi to three significant digits). */
    public String stress(double pa) {
        if (metric()) {
            return fmt("%.0f MPa", pa * 1e-6);
        }
        double psi = pa / (LBF / (0.0254 * 0.0254));
        double step = Math.pow(10, Math.max(0, Math.floor(Math.log10(psi)) - 2));
        return fmt("%,.0f psi", Math.round(psi / step) * step);
    }

    public String mass(double kg) {
        return metric() ? sig(kg) + " kg" : sig(kg / 0.45359237) + " lb";
    }

    public String speed(double mps) {
        return metric() ? sig(mps) + " m/s" : sig(mps / 0.3048) + " ft/s";
    }

    /** A height or stroke in the larger length unit: m or ft. */
    public String distance(double m) {
        return metric() ? sig(m) + " m" : sig(m / 0.3048) + " ft";
    }

    /** Three significant digits, no exponent, thousands not grouped. */
    static String sig(double v) {
        if (v == 0 || !Double.isFinite(v)) {
            return fmt("%.3g", v);
        }
        int digits = Math.max(0, 2 - (int) Math.floor(Math.log10(Math.abs(v))));
        return fmt("%." + digits + "f", v);
    }

    static String fmt(String pattern, Object... args) {
        return String.format(Locale.ROOT, pattern, args);
    }
}
