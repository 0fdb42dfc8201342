package dev.coilwise.model;

import dev.coilwise.error.BadInputException;
import dev.coilwise.error.Check;
import dev.coilwise.error.Message;
import dev.coilwise.materials.Material;

/**
 * A round-wire helical compression spring as it would be ordered. All lengths in m. The wire diameter must lie in
 * the material's range (no extrapolation of its fits), the index D/d must exceed 1 (a positive inner diameter) and
 * the free length must exceed the solid length.
 *
 * @param material     wire material
 * @param ends         end treatment
 * @param wireDiameter d, m
 * @param meanDiameter D, m
 * @param activeCoils  Na
 * @param freeLength   L0, m
 */
public record Spring(Material material, EndType ends, double wireDiameter, double meanDiameter, double activeCoils,
                     double freeLength) {
    /** Smallest spring index D/d a coil can have: at 1 the inner diameter D − d closes to nothing (geometry). */
    public static final double MIN_INDEX = 1;

    public Spring {
        Check.notNull("material", material);
        Check.notNull("end type", ends);
        Check.positive("wire diameter", wireDiameter, "m");
        material.requireCovered(wireDiameter);
        Check.positive("mean coil diameter", meanDiameter, "m");
        Check.positive("active coils", activeCoils, "");
        Check.positive("free length", freeLength, "m");
        if (meanDiameter <= MIN_INDEX * wireDiameter) {
            throw BadInputException.of(Message.SPRING_INDEX_TOO_LOW, meanDiameter / wireDiameter);
        }
        double ls = ends.solidLength(wireDiameter, ends.totalCoils(activeCoils));
        if (freeLength <= ls) {
            throw BadInputException.of(Message.SOLID_EXCEEDS_FREE, freeLength * 1e3, ls * 1e3);
        }
    }

    public Spring withFreeLength(double l0) {
        return new Spring(material, ends, wireDiameter, meanDiameter, activeCoils, l0);
    }

    public Spring withActiveCoils(double na) {
        return new Spring(material, ends, wireDiameter, meanDiameter, na, freeLength);
    }

    /** Outer diameter D + d, m. */
    public double outerDiameter() {
        return meanDiameter + wireDiameter;
    }

    /** Inner diameter D − d, m. */
    public double innerDiameter() {
        return meanDiameter - wireDiameter;
    }

    /** Spring index C = D/d. */
    public double index() {
        return meanDiameter / wireDiameter;
    }

    /** Total coils Nt. */
    public double totalCoils() {
        return ends.totalCoils(activeCoils);
    }

    /** Solid length Ls, m. */
    public double solidLength() {
        return ends.solidLength(wireDiameter, totalCoils());
    }

    /** Deflection from free length to solid, L0 − Ls, m. */
    public double deflectionToSolid() {
        return freeLength - solidLength();
    }

    /**
     * Pitch of the active coils, m: the active coils share the free length left after the end coils,
     * p = (L0 − (Ls − Na·d)) / Na (plain-ground: p = L0/Nt), as in Shigley's MED 9th ed., Table 10-1 (from memory);
     * every form gives p = d when the spring is solid.
     */
    public double pitch() {
        if (ends == EndType.PLAIN_GROUND) {
            return freeLength / totalCoils(); // Shigley's Table 10-1: L0 = p(Na + 1)
        }
        return (freeLength - (solidLength() - activeCoils * wireDiameter)) / activeCoils;
    }

    /** Shear modulus G for this wire, Pa. */
    public double shearModulus() {
        return material.shearModulus(wireDiameter);
    }

    /** Young's modulus E for this wire, Pa. */
    public double youngsModulus() {
        return material.youngsModulus(wireDiameter);
    }

    /** Rate k = G d⁴ / (8 D³ Na), N/m (Shigley's MED 9th ed., Eq. 10-9). */
    public double rate() {
        double d = wireDiameter;
        double dm = meanDiameter;
        return shearModulus() * d * d * d * d / (8 * dm * dm * dm * activeCoils);
    }

    /** Wire cross-section area π d²/4, m². */
    public double wireArea() {
        return Math.PI * wireDiameter * wireDiameter / 4;
    }

    /** Length of wire in the whole spring, Nt·π·D, m (helix angle neglected; common practice). */
    public double wireLength() {
        return totalCoils() * Math.PI * meanDiameter;
    }

    /** Mass of the whole spring, kg. */
    public double mass() {
        return wireLength() * wireArea() * material.density();
    }

    /** Mass of the active coils, Na·π·D·A·ρ, kg. */
    public double activeMass() {
        return activeCoils * Math.PI * meanDiameter * wireArea() * material.density();
    }

    /** Minimum tensile strength of this wire, Pa. */
    public double tensileStrength() {
        return material.tensileStrength(wireDiameter);
    }

    /** Force at deflection x from free length, N. */
    public double forceAt(double deflection) {
        return rate() * deflection;
    }
}
