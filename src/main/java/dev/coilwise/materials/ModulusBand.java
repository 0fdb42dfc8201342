package dev.coilwise.materials;

import dev.coilwise.error.Check;

/**
 * Elastic moduli that hold for wire diameters up to {@code maxDiameter}.
 *
 * @param maxDiameter upper end of the band, m (inclusive)
 * @param youngsModulus E, Pa
 * @param shearModulus  G, Pa
 */
public record ModulusBand(double maxDiameter, double youngsModulus, double shearModulus) {
    public ModulusBand {
        Check.positive("modulus band maximum diameter", maxDiameter, "m");
        Check.positive("Young's modulus E", youngsModulus, "Pa");
        Check.positive("shear modulus G", shearModulus, "Pa");
    }
}
