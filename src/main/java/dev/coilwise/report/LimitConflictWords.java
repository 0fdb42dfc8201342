package dev.coilwise.report;

import dev.coilwise.model.Arrest;
import dev.coilwise.model.Requirement;
import dev.coilwise.search.LimitConflict;

/**
 * Says in the designer's words why no spring can meet a force limit and what to change: the limit as given, the
 * least any spring reaches within the stroke, and the values of the limit or the stroke that would leave room. Every
 * figure to change to is rounded up, so that it is enough; the search may still ask for a little more (the spring's
 * own mass and the grid of sizes are not in the bound).
 */
public final class LimitConflictWords {
    private LimitConflictWords() {
    }

    public static String describe(LimitConflict c, Requirement req, DisplayUnits u) {
        boolean decel = c.limit().equals("deceleration");
        String stroke = u.lenWithUnit(req.limits().stroke());
        String what = req.job() instanceof Arrest
                ? (decel ? "the least peak deceleration" : "the least peak force") + " of any spring that stops the load within "
                        + "limits.stroke " + stroke + (c.preloaded() ? " (with preload from the pocket)"
                        : " (with no preload: 2 x (kinetic energy + push x stroke) / stroke)")
                : "the least cocking force of any spring that throws the payload as high from limits.stroke " + stroke
                        + " (cocked from its free length: 2 x stored energy / stroke)";
        StringBuilder sb = new StringBuilder();
        sb.append("limits.").append(c.limit()).append(' ').append(value(c.allowed(), decel, u, false))
                .append(" is below ").append(value(c.leastNeeded(), decel, u, true)).append(", ").append(what)
                .append(": raise limits.").append(c.limit()).append(" to at least ").append(value(c.leastNeeded(), decel, u, true));
        if (Double.isFinite(c.strokeNeeded())) {
            sb.append(", or limits.stroke to at least ").append(up(u.length(c.strokeNeeded()))).append(' ')
                    .append(u.lengthUnit());
        } else {
            sb.append("; no stroke is long enough while the push on the load needs that much force on its own");
        }
        if (Double.isFinite(c.withPreload())) {
            sb.append("; a preload (envelope.pocket_length shorter than the free length) lowers the least to ")
                    .append(value(c.withPreload(), decel, u, true));
        }
        return sb.toString();
    }

    private static String value(double si, boolean decel, DisplayUnits u, boolean roundUp) {
        double v = decel ? DisplayUnits.gn(si) : u.force(si);
        return (roundUp ? up(v) : DisplayUnits.sig(v)) + (decel ? " gn" : " " + u.forceUnit());
    }

    /** Three significant digits, rounded up. */
    static String up(double v) {
        if (!(v > 0) || !Double.isFinite(v)) {
            return DisplayUnits.sig(v);
        }
        double scale = Math.pow(10, Math.floor(Math.log10(v)) - 2);
        return DisplayUnits.sig(Math.ceil(v / scale - 1e-9) * scale);
    }
}
