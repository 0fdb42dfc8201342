package dev.coilwise.model;

import dev.coilwise.error.Check;

/**
 * Diametral clearance between the spring and its bore or rod: a fraction of the guide diameter, or a fixed length.
 *
 * @param fraction share of the guide diameter (used when {@code length} is NaN)
 * @param length   fixed diametral clearance, m, or NaN
 */
public record Clearance(double fraction, double length) {
    /** Default diametral clearance: 5 % of the guide diameter (common practice). */
    public static final Clearance DEFAULT = ofFraction(0.05);

    public Clearance {
        if (Double.isNaN(length)) {
            Check.inRange("envelope.clearance", fraction, 0, 0.5, "(fraction of the guide diameter)");
        } else {
            Check.nonNegative("envelope.clearance", length, "m");
        }
    }

    public static Clearance ofFraction(double f) {
        return new Clearance(f, Double.NaN);
    }

    public static Clearance ofLength(double l) {
        return new Clearance(0, l);
    }

    /** Diametral clearance for a guide of diameter {@code guide}, m. */
    public double of(double guide) {
        return Double.isNaN(length) ? fraction * guide : length;
    }
}
