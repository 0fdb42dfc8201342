package dev.coilwise.report;

import dev.coilwise.model.Gravity;
import dev.coilwise.model.UnitSystem;
import java.util.Locale;

/**
 * Units for showing SI figures to a person: millimetres, newtons and megapascals, or inches, pounds-force and kpsi.
 * Conversion factors are exact definitions (NIST SP 811, 2008 ed., Appendix B: 1 in = 0.0254 m, 1 lbf =
 * 4.4482216152605 N, 1 lb = 0.45359237 kg, 1 psi = 6894.757 Pa).
 */
public record DisplayUnits(UnitSystem system) {
    public static final double INCH = 0.0254;
    public static final double POUND_FORCE = 4.4482216152605;
    public static final double POUND = 0.45359237;
    public static final double PSI = POUND_FORCE / (INCH * INCH);

    public boolean us() {
        return system == UnitSystem.US;
    }

    public double length(double m) {
        return us() ? m / INCH : m * 1e3;
    }

    public String lengthUnit() {
        return us() ? "in" : "mm";
    }

    public double force(double n) {
        return us() ? n / POUND_FORCE : n;
    }

    public String forceUnit() {
        return us() ? "lbf" : "N";
    }

    public double rate(double nPerM) {
        return us() ? nPerM * INCH / POUND_FORCE : nPerM * 1e-3;
    }

    public String rateUnit() {
        return us() ? "lbf/in" : "N/mm";
    }

    public double stress(double pa) {
        return us() ? pa / PSI / 1e3 : pa * 1e-6;
    }

    public String stressUnit() {
        return us() ? "kpsi" : "MPa";
    }

    /** Spring mass: grams or pounds. */
    public double springMass(double kg) {
        return us() ? kg / POUND : kg * 1e3;
    }

    public String springMassUnit() {
        return us() ? "lb" : "g";
    }

    public double loadMass(double kg) {
        return us() ? kg / POUND : kg;
    }

    public String loadMassUnit() {
        return us() ? "lb" : "kg";
    }

    public double speed(double mps) {
        return us() ? mps / 0.3048 : mps;
    }

    public String speedUnit() {
        return us() ? "ft/s" : "m/s";
    }

    /** Decimal places that suit a length in this system (0.01 mm or 0.001 in). */
    public String len(double m) {
        return us() ? fmt("%.3f", length(m)) : fmt("%.1f", length(m));
    }

    /** A wire diameter: 0.01 mm or 0.0001 in, as wire sizes are written. */
    public String wireWithUnit(double m) {
        return (us() ? fmt("%.4f", length(m)) : fmt("%.2f", length(m))) + " " + lengthUnit();
    }

    public String lenWithUnit(double m) {
        return len(m) + " " + lengthUnit();
    }

    public String forceWithUnit(double n) {
        return sig(force(n)) + " " + forceUnit();
    }

    public String stressWithUnit(double pa) {
        return fmt("%.0f", stress(pa)) + " " + stressUnit();
    }

    /** Acceleration in multiples of standard gravity. */
    public static double gn(double mps2) {
        return mps2 / Gravity.STANDARD;
    }

    /** Three significant digits, no exponent for everyday magnitudes. */
    public static String sig(double v) {
        if (!Double.isFinite(v)) {
            return Double.isNaN(v) ? "-" : "inf";
        }
        double a = Math.abs(v);
        if (a >= 100 || a == 0) {
            return fmt("%.0f", v);
        }
        if (a >= 10) {
            return fmt("%.1f", v);
        }
        if (a >= 1) {
            return fmt("%.2f", v);
        }
        return fmt("%.3g", v);
    }

    public static String fmt(String pattern, Object... args) {
        return String.format(Locale.ROOT, pattern, args);
    }
}
