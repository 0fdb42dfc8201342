package dev.coilwise.mechanics;

import dev.coilwise.error.Check;

/** Torsional shear stress in the wire of a helical compression spring. */
public final class Stress {
    private Stress() {
    }

    /**
     * Corrected shear stress τ = K_B · 8FD/(πd³), Pa (Shigley's MED 9th ed., Eq. 10-7, from memory).
     *
     * @param force        axial force, N (≥ 0)
     * @param meanDiameter D, m
     * @param wireDiameter d, m
     */
    public static double corrected(double force, double meanDiameter, double wireDiameter) {
        Check.nonNegative("force", force, "N");
        Check.positive("mean coil diameter", meanDiameter, "m");
        Check.positive("wire diameter", wireDiameter, "m");
        return CurvatureFactors.bergstrasser(meanDiameter / wireDiameter) * nominal(force, meanDiameter, wireDiameter);
    }

    /** Uncorrected torsional stress 8FD/(πd³), Pa. */
    public static double nominal(double force, double meanDiameter, double wireDiameter) {
        return 8 * force * meanDiameter / (Math.PI * wireDiameter * wireDiameter * wireDiameter);
    }

    /** The force that produces corrected stress {@code tau}, N: the inverse of {@link #corrected}. */
    public static double forceFor(double tau, double meanDiameter, double wireDiameter) {
        double kb = CurvatureFactors.bergstrasser(meanDiameter / wireDiameter);
        return tau * Math.PI * wireDiameter * wireDiameter * wireDiameter / (8 * kb * meanDiameter);
    }
}
