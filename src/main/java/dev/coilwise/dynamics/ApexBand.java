package dev.coilwise.dynamics;

import dev.coilwise.error.BadInputException;
import dev.coilwise.error.Check;

/**
 * How far a launch's apex may fall short of or overshoot its target and still meet the requirement: the same band the
 * Monte Carlo counts made springs against (see {@code scatter.ScatterSettings}).
 *
 * @param shortfall how far below the target apex rise, fraction of the target (0 .. 1)
 * @param overshoot how far above it, fraction (≥ 0, may be +∞)
 */
public record ApexBand(double shortfall, double overshoot) {
    public ApexBand {
        Check.inRange("launch height shortfall", shortfall, 0, 1, "(fraction)");
        if (Double.isNaN(overshoot) || overshoot < 0) {
            throw new BadInputException("launch height overshoot must be a fraction ≥ 0, got " + overshoot);
        }
    }

    /** Lowest apex rise accepted for a target rise {@code height}, m. */
    public double lowest(double height) {
        return height * (1 - shortfall);
    }

    /** Highest apex rise accepted for a target rise {@code height}, m (+∞ without an upper bound). */
    public double highest(double height) {
        return height * (1 + overshoot);
    }
}
