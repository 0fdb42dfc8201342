package dev.coilwise.mechanics;

/**
 * How the working stresses are assumed to grow towards failure on the τ_m–τ_a diagram; the fatigue factor of safety
 * is n_f = S_sa/τ_a where the load line meets the failure curve.
 */
public enum LoadLine {
    /**
     * The line through the origin and the working point, slope r = τ_a/τ_m: the load grows in proportion. Shigley's
     * MED 9th ed., Sec. 10-9 and Example 10-4 use it for springs working from a preload (from memory). coilwise uses
     * it: for r &lt; 1 it meets the failure curve lower than {@link #CONSTANT_MINIMUM} does, so it is the more
     * cautious of the two.
     */
    PROPORTIONAL,
    /**
     * The line of slope 1 through (τ_min, 0): the preload stays fixed and only the peak grows, as when the installed
     * length is fixed by a pocket. Offered for comparison.
     */
    CONSTANT_MINIMUM
}
