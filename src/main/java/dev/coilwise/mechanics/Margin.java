package dev.coilwise.mechanics;

/**
 * One limit checked on a design, as a signed fraction of the limit: {@code value = (allowed − actual)/allowed},
 * so 0.12 means 12 % to spare and −0.05 means 5 % over.
 *
 * @param key     stable name, e.g. {@code stroke}, {@code coil_bind}, {@code stress_working}
 * @param value   signed margin, fraction of the limit (+∞ when the limit cannot be reached)
 * @param actual  the design's figure, SI
 * @param allowed the limit, SI
 * @param unit    SI unit of {@code actual} and {@code allowed}
 * @param hard    whether a negative value makes the design infeasible (false: reported only)
 */
public record Margin(String key, double value, double actual, double allowed, String unit, boolean hard) {

    /** Margin for a quantity that must stay at or below {@code allowed}. */
    public static Margin atMost(String key, double actual, double allowed, String unit, boolean hard) {
        return new Margin(key, (allowed - actual) / Math.abs(allowed), actual, allowed, unit, hard);
    }

    /** Margin for a quantity that must stay at or above {@code required}. */
    public static Margin atLeast(String key, double actual, double required, String unit, boolean hard) {
        return new Margin(key, (actual - required) / Math.abs(required), actual, required, unit, hard);
    }

    /** Whether the limit holds (margins within 1e-9 of zero count as holding, so rounding noise does not reject). */
    public boolean holds() {
        return value >= -1e-9;
    }
}
