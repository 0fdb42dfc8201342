package dev.coilwise.mechanics;

import dev.coilwise.error.BadInputException;
import dev.coilwise.error.Message;

/**
 * Stress-correction factors for the curvature of the coil and direct shear, as functions of the spring index C = D/d:
 * Shigley's MED 9th ed., Sec. 10-2, Eqs. 10-4 (Wahl) and 10-5 (Bergsträsser), from memory. The Bergsträsser form is
 * the one coilwise uses for stress; EN 13906-1 writes the same factor as k = (C + 0.5)/(C − 0.75).
 */
public final class CurvatureFactors {
    /** Smallest index for which the Bergsträsser factor is finite and positive: 4C − 3 &gt; 0. */
    public static final double MIN_INDEX = 0.75;

    private CurvatureFactors() {
    }

    /** Bergsträsser factor K_B = (4C + 2)/(4C − 3), defined for C &gt; 0.75. */
    public static double bergstrasser(double index) {
        if (!(index > MIN_INDEX) || !Double.isFinite(index)) {
            throw BadInputException.of(Message.INDEX_TOO_LOW, index);
        }
        return (4 * index + 2) / (4 * index - 3);
    }

    /** Wahl factor K_W = (4C − 1)/(4C − 4) + 0.615/C, defined for C &gt; 1. */
    public static double wahl(double index) {
        if (!(index > 1) || !Double.isFinite(index)) {
            throw BadInputException.of(Message.WAHL_INDEX_TOO_LOW, index);
        }
        return (4 * index - 1) / (4 * index - 4) + 0.615 / index;
    }
}
