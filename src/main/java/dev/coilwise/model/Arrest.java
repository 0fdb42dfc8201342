package dev.coilwise.model;

import dev.coilwise.error.Check;

/**
 * Stop a moving load within the stroke.
 *
 * @param mass         load mass, kg
 * @param contactSpeed speed at first contact with the spring, m/s (≥ 0)
 * @param angle        direction of motion below the horizontal, rad: π/2 falling straight down, 0 horizontal, −π/2 up
 * @param driveForce   constant push on the load along its motion during the stroke, N (≥ 0)
 * @param dropHeight   the drop height the speed came from, m, or NaN when the speed was given directly
 */
public record Arrest(double mass, double contactSpeed, double angle, double driveForce, double dropHeight) implements Job {
    public Arrest {
        Check.positive("load mass", mass, "kg");
        Check.nonNegative("contact speed", contactSpeed, "m/s");
        Check.inRange("direction of motion", angle, -Math.PI / 2, Math.PI / 2, "rad");
        Check.nonNegative("drive force", driveForce, "N");
    }

    @Override
    public String key() {
        return "arrest";
    }

    /** The constant force that pushes the load into the spring, Fc = m·g·sin φ + Fd, N. */
    public double pushForce() {
        return mass * Gravity.STANDARD * Math.sin(angle) + driveForce;
    }

    /** Kinetic energy at first contact, J. */
    public double kineticEnergy() {
        return 0.5 * mass * contactSpeed * contactSpeed;
    }
}
