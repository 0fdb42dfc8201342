package dev.coilwise.scatter;

import dev.coilwise.model.Gravity;

/**
 * A working figure collected from every made spring. Samples hold SI values; {@link ScatterSummary} reports them in
 * the unit the key names, the same keys as the design's JSON figures.
 */
public enum Figure {
    /** Arrest: largest compression from first contact. */
    MAX_COMPRESSION("max_compression_mm", 1e3),
    /** Arrest: peak spring force. */
    PEAK_FORCE("peak_force_N", 1),
    /** Arrest: peak deceleration of the load, in standard gravities. */
    PEAK_DECELERATION("peak_deceleration_gn", 1 / Gravity.STANDARD),
    /** Arrest: corrected stress at the peak force. */
    STRESS_AT_PEAK("stress_at_peak_MPa", 1e-6),
    /** Launch: compression at the mechanism's fixed cocked length. */
    COCKED_COMPRESSION("cocked_compression_mm", 1e3),
    /** Launch: apex rise above the nominal muzzle. */
    PREDICTED_HEIGHT("predicted_height_mm", 1e3),
    /** Launch: force at the cocked length. */
    COCKING_FORCE("cocking_force_N", 1),
    /** Launch: corrected stress at the cocked length. */
    STRESS_AT_COCKED("stress_at_cocked_MPa", 1e-6),
    /** Both: rate of the made spring. */
    RATE("rate_N_per_mm", 1e-3),
    /** Both: solid length of the made spring. */
    SOLID_LENGTH("solid_length_mm", 1e3);

    private final String key;
    private final double factor;

    Figure(String key, double factor) {
        this.key = key;
        this.factor = factor;
    }

    /** Key in the summary, with its unit. */
    public String key() {
        return key;
    }

    /** The SI value in the unit of {@link #key()}. */
    public double display(double si) {
        return si * factor;
    }
}
