package dev.coilwise.materials;

import dev.coilwise.error.BadInputException;
import dev.coilwise.error.Check;
import dev.coilwise.error.InternalFaultException;
import dev.coilwise.error.Message;
import java.util.List;

/**
 * A spring wire material: strength fit, moduli by diameter band, density, cost and static allowable stress.
 * Every figure is SI; {@link #source()} names where the row comes from.
 *
 * @param key                 stable identifier used in requirement files, e.g. {@code music-wire}
 * @param name                display name
 * @param standard            the wire standard, e.g. ASTM A228
 * @param steel               true for steels (the 2.63·D/α absolute-stability rule applies)
 * @param density             kg/m³
 * @param relativeCost        wire cost relative to hard-drawn wire (= 1.0)
 * @param allowableStatic     static allowable torsional stress before set removal, fraction of Sut
 * @param allowableSetRemoved static allowable torsional stress after set removal, fraction of Sut
 * @param strength            tensile strength bands, ascending and contiguous
 * @param moduli              modulus bands, ascending by upper diameter
 * @param source              citation of every figure in the row
 */
public record Material(String key, String name, String standard, boolean steel, double density, double relativeCost,
                       double allowableStatic, double allowableSetRemoved, List<StrengthBand> strength,
                       List<ModulusBand> moduli, String source) {

    public Material {
        Check.notNull("material key", key);
        Check.positive(key + " density", density, "kg/m^3");
        Check.positive(key + " relative cost", relativeCost, "");
        Check.inRange(key + " static allowable fraction", allowableStatic, 0.01, 1, "");
        Check.inRange(key + " set-removed allowable fraction", allowableSetRemoved, 0.01, 1, "");
        strength = List.copyOf(strength);
        moduli = List.copyOf(moduli);
        if (strength.isEmpty() || moduli.isEmpty()) {
            throw new BadInputException("material " + key + " needs at least one strength band and one modulus band");
        }
    }

    @Override
    public String toString() {
        return key;
    }

    /** Smallest wire diameter the strength fit covers, m. */
    public double minDiameter() {
        return strength.get(0).minDiameter();
    }

    /** Largest wire diameter the strength fit covers, m. */
    public double maxDiameter() {
        return strength.get(strength.size() - 1).maxDiameter();
    }

    /** Whether the strength fit covers wire diameter {@code d}, m. */
    public boolean covers(double d) {
        return strength.stream().anyMatch(b -> b.contains(d));
    }

    /**
     * Checks that the fit covers wire diameter {@code d}, m, and returns it.
     *
     * @throws BadInputException naming the diameter and the material's range when it does not
     */
    public double requireCovered(double d) {
        Check.positive("wire diameter", d, "m");
        if (!covers(d)) {
            throw BadInputException.of(Message.WIRE_OUT_OF_MATERIAL_RANGE, d * 1e3, key, minDiameter() * 1e3,
                    maxDiameter() * 1e3);
        }
        return d;
    }

    /**
     * Minimum tensile strength Sut, Pa. Where two bands meet, the lower band is used.
     *
     * @throws BadInputException when {@code d} lies outside every band (no extrapolation)
     */
    public double tensileStrength(double d) {
        requireCovered(d);
        for (StrengthBand b : strength) {
            if (b.contains(d)) {
                return b.tensileStrength(d);
            }
        }
        throw new InternalFaultException("material " + key + " covers " + d + " m but no strength band holds it");
    }

    /**
     * Static allowable torsional stress, Pa: Sut times the fraction of Shigley's MED Table 10-6 before or after set
     * removal. Compared with the Bergsträsser-corrected stress in both cases (the book pairs the set-removed fraction
     * with the direct-shear factor K_S &lt; K_B, so this is on the safe side).
     *
     * @throws BadInputException when {@code d} lies outside the material's range
     */
    public double allowableStress(double d, boolean setRemoved) {
        return tensileStrength(d) * (setRemoved ? allowableSetRemoved : allowableStatic);
    }

    private ModulusBand band(double d) {
        requireCovered(d);
        for (ModulusBand b : moduli) {
            if (d <= b.maxDiameter() * (1 + 1e-9)) {
                return b;
            }
        }
        return moduli.get(moduli.size() - 1);
    }

    /**
     * Shear modulus G for wire diameter {@code d}, Pa.
     *
     * @throws BadInputException when {@code d} lies outside the material's range (no extrapolation)
     */
    public double shearModulus(double d) {
        return band(d).shearModulus();
    }

    /**
     * Young's modulus E for wire diameter {@code d}, Pa.
     *
     * @throws BadInputException when {@code d} lies outside the material's range (no extrapolation)
     */
    public double youngsModulus(double d) {
        return band(d).youngsModulus();
    }
}
