package dev.coilwise.model;

import dev.coilwise.error.Check;

/**
 * Throw a payload, released from rest on the cocked spring, to a height.
 *
 * @param mass   payload mass, kg
 * @param height apex rise above the muzzle (the spring's free-length top), m
 * @param angle  direction above the horizontal, rad, in (0, π/2]
 * @param losses share of the stored energy lost (guide friction), in [0, 1)
 */
public record Launch(double mass, double height, double angle, double losses) implements Job {
    public Launch {
        Check.positive("payload mass", mass, "kg");
        Check.positive("launch height", height, "m");
        Check.inRange("launch direction", angle, 1e-6, Math.PI / 2, "rad");
        Check.inRange("losses", losses, 0, 0.95, "");
    }

    @Override
    public String key() {
        return "launch";
    }

    /** Share of stored energy that reaches the payload and spring, η = 1 − losses. */
    public double efficiency() {
        return 1 - losses;
    }

    /** Exit speed at the muzzle needed to rise {@link #height()} at this angle, m/s: v = √(2gH)/sin θ. */
    public double requiredExitSpeed() {
        return Math.sqrt(2 * Gravity.STANDARD * height) / Math.sin(angle);
    }
}
