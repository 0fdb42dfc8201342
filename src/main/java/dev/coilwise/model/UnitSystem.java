package dev.coilwise.model;

/** The unit system a requirement was written in, used to pick the wire series, grid rounding and display units. */
public enum UnitSystem {
    /** SI / metric: mm, N, kg; geometry rounded to 0.1 mm. */
    SI,
    /** US customary: in, lbf, lb; geometry rounded to 0.001 in. */
    US;

    /** Step of the geometry grid (mean diameter, free length), m. */
    public double lengthStep() {
        return this == SI ? 1e-4 : 0.001 * 0.0254;
    }
}
