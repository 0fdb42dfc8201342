package dev.coilwise.scatter;

import dev.coilwise.error.Check;

/**
 * The ± half-widths of the made spring's deviations from its drawing, SI. Zero means "made exactly".
 *
 * @param wireDiameter ±Δd, m
 * @param meanDiameter ±ΔD, m
 * @param freeLength   ±ΔL0, m
 * @param activeCoils  ±ΔNa, coils
 * @param shearModulus ±ΔG/G, fraction of the nominal shear modulus (0 where no source gives a scatter)
 */
public record HalfWidths(double wireDiameter, double meanDiameter, double freeLength, double activeCoils,
                         double shearModulus) {

    /** No deviation at all: the Monte Carlo then reproduces the nominal design. */
    public static final HalfWidths NONE = new HalfWidths(0, 0, 0, 0, 0);

    public HalfWidths {
        Check.nonNegative("wire diameter tolerance", wireDiameter, "m");
        Check.nonNegative("coil diameter tolerance", meanDiameter, "m");
        Check.nonNegative("free length tolerance", freeLength, "m");
        Check.nonNegative("active coils tolerance", activeCoils, "coils");
        Check.inRange("shear modulus tolerance", shearModulus, 0, 0.5, "(fraction)");
    }
}
