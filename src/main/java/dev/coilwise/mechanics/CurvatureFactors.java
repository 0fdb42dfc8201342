package dev.coilwise.mechanics;

import dev.coilwise.error.BadInputException;
import dev.coilwise.error.Message;

/**
 * Stress-correction factors for the curvature of the coil and direct shear, as functions of the spring index C = D/d.
 * Both: Shigley's MED 9th ed., Eqs. 10-4 (Wahl) and 10-5 (Bergsträsser), from memory.
 */
public final class CurvatureFactors {
    private CurvatureFactors() {
    }

    /** Bergsträsser factor K_B = (4C + 2)/(4C − 3). */
    public static double bergstrasser(double index) {
        requireIndex(index);
        return (4 * index + 2) / (4 * index - 3);
    }

    /** Wahl factor K_W = (4C − 1)/(4C − 4) + 0.615/C. */
    public static double wahl(double index) {
        requireIndex(index);
        if (index <= 1) {
            throw BadInputException.of(Message.INDEX_TOO_LOW, index);
        }
        return (4 * index - 1) / (4 * index - 4) + 0.615 / index;
    }

    private static void requireIndex(double index) {
        if (!(index > 0.75) || !Double.isFinite(index)) {
            throw BadInputException.of(Message.INDEX_TOO_LOW, index);
        }
    }
}
