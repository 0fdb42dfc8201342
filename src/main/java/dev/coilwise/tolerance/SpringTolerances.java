package dev.coilwise.tolerance;

import java.util.List;

/**
 * Permissible deviations of one spring at one EN 15800 grade, each a ± half-width in SI. Built by
 * {@link En15800#of}; a tolerance study draws each quantity from nominal ± half-width.
 *
 * @param grade         EN 15800 grade: 1 fine, 2 medium, 3 coarse
 * @param wireDiameter  ±A_d of the wire diameter, m (wire standard, see {@link WireTolerance})
 * @param meanDiameter  ±A_D of the coil diameter, m; applies alike to mean, outer and inner diameter
 * @param freeLength    ±A_L0 of the free length, m, for a spring whose free length is toleranced (when forces are
 *                      specified instead, the maker may adjust L0 and it becomes a reference dimension)
 * @param activeCoils   ± active coils (¼ coil, common practice; EN 15800 leaves the coil count to the maker)
 * @param rate          ± rate, N/m: uncompensated scatter from the wire, coil diameter and coil tolerances,
 *                      ΔR/R = 4·A_d/d + 3·A_D/D + A_n/n (first-order, from R = G d⁴/(8 D³ n); our derivation). When
 *                      the maker is held to two test forces use {@link En15800#rateTolerance} instead.
 * @param squareness    e1, deviation of the outside line from perpendicular over the free length, m; NaN for
 *                      unground ends
 * @param parallelism   e2, deviation from parallel of the ground end faces over the outer diameter, m; NaN for
 *                      unground ends
 * @param notes         where the figures leave the standard: scope exceeded, table clamped or extrapolated
 */
public record SpringTolerances(int grade, double wireDiameter, double meanDiameter, double freeLength,
                               double activeCoils, double rate, double squareness, double parallelism,
                               List<String> notes) {
    public SpringTolerances {
        notes = List.copyOf(notes);
    }

    /** ±A_De of the outer diameter, m (EN 15800 Table 1 applies to D, De and Di alike). */
    public double outerDiameter() {
        return meanDiameter;
    }

    /** ±A_Di of the inner diameter, m. */
    public double innerDiameter() {
        return meanDiameter;
    }

    /** Whether every figure lies inside the standard's scope and printed table. */
    public boolean withinStandard() {
        return notes.isEmpty();
    }
}
