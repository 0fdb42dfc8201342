package dev.coilwise.mechanics;

import dev.coilwise.model.Seating;
import dev.coilwise.model.Spring;

/**
 * Buckling of a compression spring between its seats (Shigley's MED 9th ed., Sec. 10-10, Eqs. 10-10 to 10-13,
 * from memory).
 *
 * <p>A steel spring whose free length is below the absolute-stability length 2.63·D/α cannot buckle. Otherwise the
 * critical deflection is y_cr = L0·C1'·[1 − √(1 − C2'/λ²)] with λ = α·L0/D, C1' = E/(2(E − G)) and
 * C2' = 2π²(E − G)/(2G + E); when C2'/λ² ≥ 1 the root does not exist and the spring is stable too.
 */
public final class Buckling {
    /**
     * Coefficient of the absolute-stability length of steel springs, L0 &lt; 2.63·D/α (Shigley's MED 9th ed.,
     * Eq. 10-13, from memory; it is π·√(2(E − G)/(2G + E)) = 2.626 for E = 207 GPa, G = 79.3 GPa, the steel
     * constants of the same book's Table A-5).
     */
    public static final double STEEL_STABILITY_COEFFICIENT = 2.63;

    private Buckling() {
    }

    /** Free length below which a steel spring cannot buckle, 2.63·D/α, m. */
    public static double absoluteStabilityLength(double meanDiameter, Seating seating) {
        return STEEL_STABILITY_COEFFICIENT * meanDiameter / seating.alpha();
    }

    /**
     * Free length below which a spring of any material cannot buckle, (π·D/α)·√(2(E − G)/(2G + E)), m: the length at
     * which C2'/λ² = 1 (Shigley's MED 9th ed., Eq. 10-13, from memory).
     *
     * @param meanDiameter  D, m
     * @param youngsModulus E, Pa
     * @param shearModulus  G, Pa
     * @param alpha         end-condition constant α
     */
    public static double stabilityLength(double meanDiameter, double youngsModulus, double shearModulus, double alpha) {
        double e = youngsModulus;
        double g = shearModulus;
        return Math.PI * meanDiameter / alpha * Math.sqrt(2 * (e - g) / (2 * g + e));
    }

    /**
     * Critical deflection of this spring on these seats, m: +∞ for a steel spring shorter than
     * {@link #absoluteStabilityLength}, otherwise {@link #criticalDeflection(double, double, double, double, double)}.
     */
    public static double criticalDeflection(Spring spring, Seating seating) {
        if (spring.material().steel()
                && spring.freeLength() < absoluteStabilityLength(spring.meanDiameter(), seating)) {
            return Double.POSITIVE_INFINITY;
        }
        return criticalDeflection(spring.freeLength(), spring.meanDiameter(), spring.youngsModulus(),
                spring.shearModulus(), seating.alpha());
    }

    /**
     * Critical deflection y_cr = L0·C1'·[1 − √(1 − C2'/λ²)], λ = α·L0/D, C1' = E/(2(E − G)),
     * C2' = 2π²(E − G)/(2G + E), m. Returns +∞ when C2'/λ² ≥ 1 (the spring cannot buckle).
     *
     * @param freeLength    L0, m
     * @param meanDiameter  D, m
     * @param youngsModulus E, Pa
     * @param shearModulus  G, Pa
     * @param alpha         end-condition constant α
     */
    public static double criticalDeflection(double freeLength, double meanDiameter, double youngsModulus,
                                            double shearModulus, double alpha) {
        double e = youngsModulus;
        double g = shearModulus;
        double lambda = alpha * freeLength / meanDiameter;
        double c1 = e / (2 * (e - g));
        double c2 = 2 * Math.PI * Math.PI * (e - g) / (2 * g + e);
        double ratio = c2 / (lambda * lambda);
        if (ratio >= 1) {
            return Double.POSITIVE_INFINITY;
        }
        return freeLength * c1 * (1 - Math.sqrt(1 - ratio));
    }
}
