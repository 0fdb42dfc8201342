package dev.coilwise.mechanics;

import dev.coilwise.model.Seating;
import dev.coilwise.model.Spring;

/**
 * Buckling of a compression spring between its seats (Shigley's MED 9th ed., Sec. 10-10, Eqs. 10-10 to 10-13,
 * from memory).
 */
public final class Buckling {
    /** Coefficient of the absolute-stability length of steel springs, L0 &lt; 2.63·D/α. */
    public static final double STEEL_STABILITY_COEFFICIENT = 2.63;

    private Buckling() {
    }

    /** Free length below which a steel spring cannot buckle, 2.63·D/α, m. */
    public static double absoluteStabilityLength(double meanDiameter, Seating seating) {
        return STEEL_STABILITY_COEFFICIENT * meanDiameter / seating.alpha();
    }

    /**
     * Critical deflection y_cr = L0·C1'·[1 − √(1 − C2'/λ²)], λ = α·L0/D, C1' = E/(2(E − G)),
     * C2' = 2π²(E − G)/(2G + E), m. Returns +∞ when C2'/λ² ≥ 1 (the spring cannot buckle).
     */
    public static double criticalDeflection(Spring spring, Seating seating) {
        double e = spring.youngsModulus();
        double g = spring.shearModulus();
        double l0 = spring.freeLength();
        double lambda = seating.alpha() * l0 / spring.meanDiameter();
        double c1 = e / (2 * (e - g));
        double c2 = 2 * Math.PI * Math.PI * (e - g) / (2 * g + e);
        double ratio = c2 / (lambda * lambda);
        if (ratio >= 1) {
            return Double.POSITIVE_INFINITY;
        }
        return l0 * c1 * (1 - Math.sqrt(1 - ratio));
    }
}
