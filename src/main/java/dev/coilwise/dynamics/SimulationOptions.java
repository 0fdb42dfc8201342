package dev.coilwise.dynamics;

import dev.coilwise.error.BadInputException;
import dev.coilwise.error.Check;
import dev.coilwise.error.Message;

/**
 * Settings of one time-domain simulation.
 *
 * @param masses       number N of lumped masses the active coils are split into (2..400; default
 *                     {@value #DEFAULT_MASSES})
 * @param dampingRatio material damping as the damping ratio of the chain's first fixed-fixed mode, in [0, 0.5]
 *                     (default 0: undamped, the conservative choice for rebound and surge)
 * @param keepHistory  whether to keep the time history (for the CSV and the chart); the summary is always made
 */
public record SimulationOptions(int masses, double dampingRatio, boolean keepHistory) {
    /** Default number of lumped masses, 20: the lowest mode is then within 0.1 % of the continuous spring. */
    public static final int DEFAULT_MASSES = 20;
    /** Fewest masses accepted. */
    public static final int MIN_MASSES = 2;
    /**
     * Most masses accepted: the cost grows with N² (steps ∝ the chain's highest frequency ∝ N, work per step ∝ N),
     * about 100 times the default's at 200 masses.
     */
    public static final int MAX_MASSES = 400;
    /** Largest damping ratio accepted; spring steels are far below it. */
    public static final double MAX_DAMPING_RATIO = 0.5;

    public SimulationOptions {
        if (masses < MIN_MASSES || masses > MAX_MASSES) {
            throw BadInputException.of(Message.OUT_OF_RANGE, "simulation masses", MIN_MASSES, MAX_MASSES, "",
                    masses, "");
        }
        Check.inRange("simulation damping ratio", dampingRatio, 0, MAX_DAMPING_RATIO, "");
    }

    /** 20 masses, undamped, no history. */
    public static SimulationOptions defaults() {
        return new SimulationOptions(DEFAULT_MASSES, 0, false);
    }

    public SimulationOptions withMasses(int n) {
        return new SimulationOptions(n, dampingRatio, keepHistory);
    }

    public SimulationOptions withDampingRatio(double zeta) {
        return new SimulationOptions(masses, zeta, keepHistory);
    }

    public SimulationOptions withHistory(boolean keep) {
        return new SimulationOptions(masses, dampingRatio, keep);
    }
}
