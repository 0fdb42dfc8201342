package dev.coilwise.mechanics;

import dev.coilwise.model.Spring;

/** Growth of the coil diameter as a compression spring closes. */
public final class SolidGrowth {
    private SolidGrowth() {
    }

    /**
     * Outer diameter at solid, OD_s = √(D² + (p² − d²)/π²) + d, m, p the free pitch of the active coils. The wire
     * length of one turn, √((πD)² + p²), is kept as the helix closes to pitch d with the number of turns unchanged
     * (geometry; the same relation is given in the Spring Manufacturers Institute's Handbook of Spring Design, from
     * memory). Friction at the seats, which can hold the end coils back, is neglected.
     */
    public static double outerDiameterAtSolid(Spring spring) {
        double d = spring.wireDiameter();
        double dm = spring.meanDiameter();
        double p = spring.pitch();
        return Math.sqrt(dm * dm + Math.max(0, p * p - d * d) / (Math.PI * Math.PI)) + d;
    }
}
