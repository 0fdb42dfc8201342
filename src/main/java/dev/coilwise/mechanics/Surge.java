package dev.coilwise.mechanics;

import dev.coilwise.error.Check;
import dev.coilwise.model.Spring;

/** Natural frequency and surge-wave stress of a helical spring. */
public final class Surge {
    private Surge() {
    }

    /**
     * Lowest natural frequency with both ends fixed, f = ½√(k/m_a), Hz (Shigley's MED 9th ed., Sec. 10-9, from memory),
     * m_a the mass of the active coils.
     */
    public static double frequencyFixedFixed(Spring spring) {
        return 0.5 * Math.sqrt(spring.rate() / spring.activeMass());
    }

    /** Lowest natural frequency with one end fixed and the other free, ¼√(k/m_a), Hz (same source). */
    public static double frequencyFixedFree(Spring spring) {
        return 0.5 * frequencyFixedFixed(spring);
    }

    /**
     * Shear stress of the surge wave when one end is struck or released at speed {@code v}: τ = v·√(2ρG), Pa
     * (A. M. Wahl, Mechanical Springs, 2nd ed., ch. on spring surge, from memory). It follows from the axial wave in
     * the active coils: wave speed c = L·√(k/m_a), end force F = k·L·v/c = v·√(k·m_a), and 8FD/(πd³) with k and m_a
     * written out. No curvature factor is applied, as in the source.
     */
    public static double waveStress(double speed, double density, double shearModulus) {
        Check.nonNegative("impact speed", speed, "m/s");
        return speed * Math.sqrt(2 * density * shearModulus);
    }

    /** Highest end speed whose surge stress stays within {@code allowable}: v = τ/√(2ρG), m/s. */
    public static double speedLimit(double allowable, double density, double shearModulus) {
        return allowable / Math.sqrt(2 * density * shearModulus);
    }
}
