package dev.coilwise.scatter;

import dev.coilwise.materials.Material;
import dev.coilwise.materials.ModulusBand;
import dev.coilwise.materials.StrengthBand;
import dev.coilwise.model.Spring;
import java.util.List;

/**
 * Builds made springs from a nominal one and normalised deviations. The wire keeps the strength and moduli of its
 * nominal size (the wire is bought, certified and tabulated by nominal diameter; a deviation within tolerance does
 * not move it into another strength or modulus band), so the material is pinned to the nominal wire's S_ut, E and G;
 * only a modulus scatter from the tolerance source changes G.
 */
final class SpringMaker {
    private final Spring nominal;
    private final HalfWidths halfWidths;
    private final Material pinned;

    SpringMaker(Spring nominal, HalfWidths halfWidths) {
        this.nominal = nominal;
        this.halfWidths = halfWidths;
        this.pinned = pin(1.0);
    }

    private Material pin(double modulusScale) {
        Material m = nominal.material();
        double d = nominal.wireDiameter();
        StrengthBand strength = new StrengthBand(d / 2, 2 * d, 0, nominal.tensileStrength() * 1e-6);
        ModulusBand moduli = new ModulusBand(1.0, nominal.youngsModulus(), nominal.shearModulus() * modulusScale);
        return new Material(m.key(), m.name(), m.standard(), m.steel(), m.density(), m.relativeCost(),
                m.allowableStatic(), m.allowableSetRemoved(), List.of(strength), List.of(moduli), m.source());
    }

    /** The wire of every made spring without modulus scatter: the nominal wire's S_ut, E and G in one band. */
    Material pinned() {
        return pinned;
    }

    /** The free length deviation of a made spring from its normalised deviations, m. */
    double freeLengthDeviation(double[] z) {
        return z[2] * halfWidths.freeLength() / DeviationSampler.SIGMAS;
    }

    /**
     * The made spring for normalised deviations {@code z} (d, D, L0, Na, G).
     *
     * @throws dev.coilwise.error.BadInputException when the deviations give a spring that cannot exist
     */
    Spring make(double[] z) {
        double s = DeviationSampler.SIGMAS;
        double gScale = 1 + z[4] * halfWidths.shearModulus() / s;
        Material m = gScale == 1 ? pinned : pin(gScale);
        return new Spring(m, nominal.ends(),
                nominal.wireDiameter() + z[0] * halfWidths.wireDiameter() / s,
                nominal.meanDiameter() + z[1] * halfWidths.meanDiameter() / s,
                nominal.activeCoils() + z[3] * halfWidths.activeCoils() / s,
                nominal.freeLength() + freeLengthDeviation(z));
    }
}
