package dev.coilwise.report.html;

/**
 * One limit checked on a design, as the report shows it.
 *
 * @param key     limit key, e.g. {@code stroke}, {@code coil_bind}
 * @param value   signed margin, fraction of the limit; +∞ when the limit cannot be reached (saved as null)
 * @param actual  the design's figure, SI (NaN if not saved)
 * @param allowed the limit, SI (NaN or +∞ when none)
 * @param unit    SI unit of actual and allowed
 * @param hard    whether failing it makes the design infeasible (false: reported only)
 * @param holds   whether the limit holds
 */
public record ReportMargin(String key, double value, double actual, double allowed, String unit, boolean hard,
                           boolean holds) {
    static ReportMargin from(JsonIn m) {
        double pct = m.number("margin_pct");
        return new ReportMargin(m.text("limit"), Double.isNaN(pct) ? Double.POSITIVE_INFINITY : pct / 100,
                m.number("actual"), m.number("allowed"), m.text("unit", ""), m.flag("hard"), m.flag("holds"));
    }

    /** Whether the limit cannot be reached at all (e.g. a spring that cannot buckle). */
    public boolean unbounded() {
        return Double.isInfinite(value);
    }
}
