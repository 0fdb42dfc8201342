package dev.coilwise.mechanics;

import dev.coilwise.error.Check;
import dev.coilwise.model.Gravity;

/**
 * Energy balance of a payload thrown by a cocked spring, released from rest at compression x_c, separating at free
 * length: η·½·k·x_c² = (m + m_a/2)·g·sin θ·x_c + ½·(m + m_a/3)·v²; apex rise H = (v·sin θ)²/(2g).
 * The m_a/2 and m_a/3 terms are the classic lumped corrections for the spring's own active mass m_a (the coils'
 * centre of mass rises half the stroke; the kinetic energy of a linearly varying velocity field is one third).
 */
public final class LaunchBalance {
    private LaunchBalance() {
    }

    /**
     * Exit speed at the muzzle from cocked compression x_c, m/s; zero when the stored energy does not lift the
     * payload and coils to free length.
     */
    public static double exitSpeed(double rate, double cocked, double mass, double activeMass, double angle,
                                   double efficiency) {
        Check.positive("rate", rate, "N/m");
        Check.nonNegative("cocked compression", cocked, "m");
        Check.positive("payload mass", mass, "kg");
        Check.nonNegative("active spring mass", activeMass, "kg");
        double stored = efficiency * 0.5 * rate * cocked * cocked;
        double lift = (mass + activeMass / 2) * Gravity.STANDARD * Math.sin(angle) * cocked;
        double kinetic = stored - lift;
        if (kinetic <= 0) {
            return 0;
        }
        return Math.sqrt(2 * kinetic / (mass + activeMass / 3));
    }

    /** Apex rise above the muzzle for exit speed {@code v} at angle θ, (v·sin θ)²/(2g), m. */
    public static double apexRise(double exitSpeed, double angle) {
        double vy = exitSpeed * Math.sin(angle);
        return vy * vy / (2 * Gravity.STANDARD);
    }

    /** Apex rise above the muzzle from cocked compression x_c, m. */
    public static double height(double rate, double cocked, double mass, double activeMass, double angle,
                                double efficiency) {
        return apexRise(exitSpeed(rate, cocked, mass, activeMass, angle, efficiency), angle);
    }

    /**
     * Cocked compression that throws the payload to apex rise {@code height}, m: the positive root of
     * ½ηk x² − (m + m_a/2) g sin θ x − ½(m + m_a/3) v² = 0 with v = √(2gH)/sin θ.
     */
    public static double cockedCompression(double rate, double height, double mass, double activeMass, double angle,
                                           double efficiency) {
        Check.positive("rate", rate, "N/m");
        Check.positive("launch height", height, "m");
        Check.positive("efficiency", efficiency, "");
        double s = Math.sin(angle);
        double v2 = 2 * Gravity.STANDARD * height / (s * s);
        double a = 0.5 * efficiency * rate;
        double b = (mass + activeMass / 2) * Gravity.STANDARD * s;
        double c = 0.5 * (mass + activeMass / 3) * v2;
        return (b + Math.sqrt(b * b + 4 * a * c)) / (2 * a);
    }
}
