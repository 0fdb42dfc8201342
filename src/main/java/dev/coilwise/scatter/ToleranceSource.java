package dev.coilwise.scatter;

import dev.coilwise.model.Spring;

/**
 * Where the Monte Carlo gets its tolerances: the ± half-widths for one spring at one tolerance grade.
 * {@link #en15800()} adapts {@code dev.coilwise.tolerance} (the default); {@link #fixed} serves explicit figures
 * (tests, user-given tolerances).
 */
@FunctionalInterface
public interface ToleranceSource {
    /**
     * @param spring the nominal spring
     * @param grade  EN 15800 tolerance grade 1, 2 or 3
     */
    HalfWidths halfWidths(Spring spring, int grade);

    /** EN 15800 by grade, no modulus scatter ({@link En15800Tolerances}). */
    static ToleranceSource en15800() {
        return new En15800Tolerances();
    }

    /** The same half-widths for every spring and grade. */
    static ToleranceSource fixed(HalfWidths halfWidths) {
        return (spring, grade) -> halfWidths;
    }
}
