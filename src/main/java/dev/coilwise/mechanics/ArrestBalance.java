package dev.coilwise.mechanics;

import dev.coilwise.error.Check;

/**
 * Energy balance of a load arrested by a massless linear spring:
 * ½·m·v0² + Fc·x = F0·x + ½·k·x², Fc = m·g·sin φ + Fd the constant push, F0 the preload.
 */
public final class ArrestBalance {
    private ArrestBalance() {
    }

    /**
     * Largest compression from first contact, the positive root of ½k x² + (F0 − Fc) x − ½ m v0² = 0, m.
     *
     * @param rate      k, N/m
     * @param mass      m, kg
     * @param speed     v0 at contact, m/s
     * @param pushForce Fc, N (may be negative when moving upward)
     * @param preload   F0, N (≥ 0)
     */
    public static double maxCompression(double rate, double mass, double speed, double pushForce, double preload) {
        Check.positive("rate", rate, "N/m");
        Check.positive("mass", mass, "kg");
        Check.nonNegative("contact speed", speed, "m/s");
        Check.nonNegative("preload", preload, "N");
        double b = preload - pushForce;
        double disc = b * b + rate * mass * speed * speed;
        // Numerically stable form of (−b + √disc)/k.
        double root = Math.sqrt(disc);
        if (b <= 0) {
            return (-b + root) / rate;
        }
        return mass * speed * speed / (b + root);
    }

    /** Peak spring force, F0 + k·x_max, N. */
    public static double peakForce(double rate, double preload, double maxCompression) {
        return preload + rate * maxCompression;
    }

    /** Peak deceleration of the load, (F0 + k·x_max − Fc)/m, m/s². */
    public static double peakDeceleration(double peakForce, double pushForce, double mass) {
        return (peakForce - pushForce) / mass;
    }

    /** Contact speed after a free fall from {@code height}, √(2gh), m/s. */
    public static double dropSpeed(double height) {
        Check.nonNegative("drop height", height, "m");
        return Math.sqrt(2 * dev.coilwise.model.Gravity.STANDARD * height);
    }
}
