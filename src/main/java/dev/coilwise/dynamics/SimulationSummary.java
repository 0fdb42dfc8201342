package dev.coilwise.dynamics;

import java.util.List;

/**
 * What the time-domain simulation of one design found. SI throughout; NaN where a figure does not apply to the job.
 *
 * @param masses            number N of lumped masses used
 * @param maxCompression    arrest: largest travel of the load from first contact; launch: the cocked compression, m
 * @param peakForce         largest force in the top element (between spring and load), N
 * @param peakStress        largest Bergsträsser-corrected shear stress of any element, Pa, from the element's own
 *                          (wire) force; the extra force of touching coils is not wire torsion and is left out
 * @param coilClash         whether any element closed to its share of the solid length
 * @param firstClashTime    time of the first clash, s, or NaN
 * @param firstClashElement element of the first clash, 1 at the fixed base to N + 1 at the top, or 0 without clash
 * @param deviationPct      largest relative difference from the energy balance, %: maximum compression and peak
 *                          force (arrest) or exit speed and apex (launch)
 * @param stopTime          arrest: time from first contact until the load's speed first reaches zero, s
 * @param reboundSpeed      arrest: speed of the load as it leaves the spring, m/s (0 if it stays on it)
 * @param exitSpeed         launch: speed at the muzzle equivalent to the payload's flight, m/s (0 if it stays in
 *                          the guide)
 * @param apex              launch: rise of the payload's highest point above the muzzle, m (negative: it does not
 *                          leave the guide)
 * @param flags             warnings: each says what happened (stress over the allowable, clash, deviation, light
 *                          load, unfinished event); empty when the simulation confirms the balance
 * @param notes             information that is no fault of the design, e.g. the rebound of an arrest
 */
public record SimulationSummary(int masses, double maxCompression, double peakForce, double peakStress,
                                boolean coilClash, double firstClashTime, int firstClashElement, double deviationPct,
                                double stopTime, double reboundSpeed, double exitSpeed, double apex,
                                List<String> flags, List<String> notes) {

    public SimulationSummary {
        flags = List.copyOf(flags);
        notes = List.copyOf(notes);
    }

    /** A copy with these flags and notes. */
    public SimulationSummary withFlags(List<String> newFlags, List<String> newNotes) {
        return new SimulationSummary(masses, maxCompression, peakForce, peakStress, coilClash, firstClashTime,
                firstClashElement, deviationPct, stopTime, reboundSpeed, exitSpeed, apex, newFlags, newNotes);
    }

    /** Whether any warning was raised. */
    public boolean flagged() {
        return !flags.isEmpty();
    }
}
