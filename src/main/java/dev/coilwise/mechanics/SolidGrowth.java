package dev.coilwise.mechanics;

import dev.coilwise.model.Spring;

/** Growth of the coil diameter as a compression spring closes. */
public final class SolidGrowth {
    private SolidGrowth() {
    }

    /**
     * Outer diameter at solid, OD_s = √(D² + (p² − d²)/π²) + d, m, p the free pitch of the active coils: the wire
     * length per coil is conserved as the helix flattens (common practice; the relation appears in EN 13906-1 and in
     * spring-maker handbooks, from memory).
     */
    public static double outerDiameterAtSolid(Spring spring) {
        double d = spring.wireDiameter();
        double dm = spring.meanDiameter();
        double p = spring.pitch();
        return Math.sqrt(dm * dm + Math.max(0, p * p - d * d) / (Math.PI * Math.PI)) + d;
    }
}
