package dev.coilwise.dynamics;

import dev.coilwise.model.Gravity;
import dev.coilwise.model.UnitSystem;

/**
 * Display scale (SI value × scale) and symbol of the figures the simulation's words quote: millimetres, newtons,
 * megapascals, kilograms and metres per second, or inches, pounds-force, kpsi, pounds and feet per second for US
 * customary units. Exact factors: NIST SP 811, 2008 ed., Appendix B. Decelerations are shown in gn (standard
 * gravity, 9.80665 m/s², 3rd CGPM 1901) in both systems, as the reports show them.
 */
record ShownUnits(UnitSystem units) {
    static final double INCH = 0.0254, POUND_FORCE = 4.4482216152605, POUND = 0.45359237, FOOT = 0.3048,
            KPSI = 1e3 * POUND_FORCE / (INCH * INCH);

    boolean us() {
        return units == UnitSystem.US;
    }

    double length(double m) {
        return us() ? m / INCH : m * 1e3;
    }

    String lengthUnit() {
        return us() ? "in" : "mm";
    }

    double force(double n) {
        return us() ? n / POUND_FORCE : n;
    }

    String forceUnit() {
        return us() ? "lbf" : "N";
    }

    double stress(double pa) {
        return us() ? pa / KPSI : pa * 1e-6;
    }

    String stressUnit() {
        return us() ? "kpsi" : "MPa";
    }

    double mass(double kg) {
        return us() ? kg / POUND : kg;
    }

    String massUnit() {
        return us() ? "lb" : "kg";
    }

    double speed(double mps) {
        return us() ? mps / FOOT : mps;
    }

    String speedUnit() {
        return us() ? "ft/s" : "m/s";
    }

    /** Acceleration in multiples of standard gravity. */
    static double gn(double mps2) {
        return mps2 / Gravity.STANDARD;
    }
}
