package dev.coilwise.mechanics;

import dev.coilwise.error.Check;
import java.util.Locale;

/**
 * Fatigue-failure criteria in torsion on the τ_m–τ_a diagram, as Shigley's MED 9th ed., Sec. 10-9 applies them to
 * helical springs (from memory): a measured strength point (S_sa, S_sm) is first converted to a fully reversed
 * endurance strength S_se, then the failure curve runs from (0, S_se) to (S_su, 0), with S_su = 0.67·S_ut.
 */
public enum FatigueCriterion {
    /** Gerber parabola S_sa/S_se + (S_sm/S_su)² = 1 (Shigley's MED 9th ed., Sec. 10-9, from memory). */
    GERBER {
        @Override
        public double enduranceStrength(FatigueStrength p, double ssu) {
            double ratio = p.mean() / ssu;
            return p.amplitude() / (1 - ratio * ratio);
        }

        @Override
        double proportional(double sse, double ssu, double tauA, double tauM) {
            // Shigley's S_sa = r²S_su²/(2S_se)·[−1 + √(1 + (2S_se/(rS_su))²)], r = τa/τm, rewritten without
            // cancellation as 2S_se/(1 + √(1 + u²)), u = 2S_se·τm/(τa·S_su); it gives S_se when τm = 0.
            double u = 2 * sse * tauM / (tauA * ssu);
            return 2 * sse / (1 + Math.sqrt(1 + u * u));
        }

        @Override
        double constantMinimum(double sse, double ssu, double tauMin) {
            // S_sa = S_se·(1 − ((S_sa + τmin)/S_su)²), a quadratic q·S² + (2qc + 1)·S + qc² − S_se = 0, q = S_se/S_su².
            double q = sse / (ssu * ssu);
            double b = 2 * q * tauMin + 1;
            double c = q * tauMin * tauMin - sse;
            if (c >= 0) {
                return 0;
            }
            return -2 * c / (b + Math.sqrt(b * b - 4 * q * c));
        }
    },
    /** Goodman line S_sa/S_se + S_sm/S_su = 1 (Shigley's MED 9th ed., Sec. 10-9, from memory). */
    GOODMAN {
        @Override
        public double enduranceStrength(FatigueStrength p, double ssu) {
            return p.amplitude() / (1 - p.mean() / ssu);
        }

        @Override
        double proportional(double sse, double ssu, double tauA, double tauM) {
            // S_sa = r·S_se·S_su/(r·S_su + S_se), r = τa/τm, multiplied through by τm.
            return tauA * sse * ssu / (tauA * ssu + tauM * sse);
        }

        @Override
        double constantMinimum(double sse, double ssu, double tauMin) {
            return Math.max(0, sse * (ssu - tauMin) / (ssu + sse));
        }
    };

    /** Ratio of torsional to tensile ultimate strength, S_su = 0.67·S_ut (Shigley's MED 9th ed., Eq. 10-30, from memory). */
    public static final double ULTIMATE_SHEAR_RATIO = 0.67;

    /**
     * The fully reversed endurance strength S_se, Pa, whose failure curve passes through the strength point.
     *
     * @param point measured strength point
     * @param ssu   torsional ultimate strength S_su, Pa; must exceed the point's mean stress
     */
    public abstract double enduranceStrength(FatigueStrength point, double ssu);

    abstract double proportional(double sse, double ssu, double tauA, double tauM);

    abstract double constantMinimum(double sse, double ssu, double tauMin);

    /**
     * The amplitude strength S_sa, Pa, where the load line through the working point (τ_m, τ_a) meets this
     * criterion's failure curve.
     *
     * @param sse  fully reversed endurance strength, Pa
     * @param ssu  torsional ultimate strength, Pa
     * @param line the load line
     * @param tauA working stress amplitude, Pa (&gt; 0)
     * @param tauM working mean stress, Pa (≥ τ_a for a spring, which never reverses)
     */
    public double amplitudeStrength(double sse, double ssu, LoadLine line, double tauA, double tauM) {
        Check.positive("fatigue endurance strength", sse, "Pa");
        Check.positive("torsional ultimate strength", ssu, "Pa");
        Check.positive("stress amplitude", tauA, "Pa");
        Check.nonNegative("mean stress", tauM, "Pa");
        return line == LoadLine.PROPORTIONAL ? proportional(sse, ssu, tauA, tauM)
                : constantMinimum(sse, ssu, Math.max(0, tauM - tauA));
    }

    /**
     * Fatigue factor of safety n_f = S_sa/τ_a for the strength point, Shigley's MED 9th ed., Sec. 10-9 (from memory).
     *
     * @param point measured strength point
     * @param sut   tensile strength of the wire, Pa
     * @param line  the load line
     * @param tauA  working stress amplitude, Pa (&gt; 0)
     * @param tauM  working mean stress, Pa
     */
    public double safetyFactor(FatigueStrength point, double sut, LoadLine line, double tauA, double tauM) {
        double ssu = ULTIMATE_SHEAR_RATIO * Check.positive("tensile strength", sut, "Pa");
        if (point.mean() >= ssu) {
            return 0; // the wire cannot carry this data set's mean stress at all
        }
        return amplitudeStrength(enduranceStrength(point, ssu), ssu, line, tauA, tauM) / tauA;
    }

    /** Lower-case name used in {@link FatigueCheck#criterion()}. */
    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }
}
