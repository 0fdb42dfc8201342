package dev.coilwise.mechanics;

import dev.coilwise.error.Check;

/**
 * Impact factor of a weight dropped onto a massless linear spring: δ_max/δ_st = 1 + √(1 + 2h/δ_st)
 * (J. M. Gere, Mechanics of Materials, Sec. 2.8 "Impact loading", from memory). With h = 0 it gives 2, the factor of a
 * suddenly applied load (common practice).
 */
public final class ImpactFactor {
    private ImpactFactor() {
    }

    /**
     * @param dropHeight   h, height fallen before contact, m (≥ 0)
     * @param staticDeflection δ_st = W/k, m (&gt; 0)
     */
    public static double of(double dropHeight, double staticDeflection) {
        Check.nonNegative("drop height", dropHeight, "m");
        Check.positive("static deflection", staticDeflection, "m");
        return 1 + Math.sqrt(1 + 2 * dropHeight / staticDeflection);
    }
}
