package dev.coilwise.scatter;

import dev.coilwise.model.Spring;
import dev.coilwise.tolerance.En15800;
import dev.coilwise.tolerance.SpringTolerances;

/**
 * Tolerances of EN 15800 (via {@link En15800}): wire diameter from the wire standard, coil diameter and free length
 * by grade, ±¼ active coil (see {@code dev.coilwise.tolerance} for the provenance of each figure). No modulus
 * scatter: neither EN 15800 nor the material table gives one, so G is held at its tabulated value.
 */
public final class En15800Tolerances implements ToleranceSource {
    @Override
    public HalfWidths halfWidths(Spring spring, int grade) {
        SpringTolerances t = En15800.of(spring, grade);
        return new HalfWidths(t.wireDiameter(), t.meanDiameter(), t.freeLength(), t.activeCoils(), 0);
    }
}
