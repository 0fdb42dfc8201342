package dev.coilwise.materials;

import dev.coilwise.error.Check;

/**
 * One diameter band of the minimum tensile strength fit Sut = A / d^m.
 *
 * @param minDiameter smallest wire diameter of the band, m
 * @param maxDiameter largest wire diameter of the band, m
 * @param exponent    m, dimensionless
 * @param constantMpaMm A in MPa·mm^m, as the tables print it
 */
public record StrengthBand(double minDiameter, double maxDiameter, double exponent, double constantMpaMm) {
    public StrengthBand {
        Check.positive("band minimum diameter", minDiameter, "m");
        Check.positive("band maximum diameter", maxDiameter, "m");
        Check.nonNegative("strength exponent m", exponent, "");
        Check.positive("strength constant A", constantMpaMm, "MPa*mm^m");
    }

    public boolean contains(double d) {
        return d >= minDiameter * (1 - 1e-9) && d <= maxDiameter * (1 + 1e-9);
    }

    /** Minimum tensile strength, Pa, for wire diameter {@code d} in m. */
    public double tensileStrength(double d) {
        return constantMpaMm / Math.pow(d * 1e3, exponent) * 1e6;
    }
}
