package dev.coilwise.model;

import dev.coilwise.error.Check;
import java.util.OptionalDouble;

/**
 * Limits on the working event.
 *
 * @param stroke       most compression allowed, m (arrest: from first contact while stopping; launch: cocked)
 * @param peakForce    optional force limit, N (arrest: peak; launch: cocking force)
 * @param deceleration optional limit on the load's deceleration, m/s² (arrest only)
 */
public record Limits(double stroke, OptionalDouble peakForce, OptionalDouble deceleration) {
    public Limits {
        Check.positive("limits.stroke", stroke, "m");
        peakForce.ifPresent(v -> Check.positive("limits.peak_force", v, "N"));
        deceleration.ifPresent(v -> Check.positive("limits.deceleration", v, "m/s^2"));
    }
}
