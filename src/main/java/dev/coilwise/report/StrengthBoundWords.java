package dev.coilwise.report;

import dev.coilwise.model.Arrest;
import dev.coilwise.model.Requirement;
import dev.coilwise.search.Diagnosis;
import dev.coilwise.search.StrengthBound;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Says in the designer's words what force the job needs within the stroke (work-energy balance) and how much the
 * strongest spring of the design space takes, and, when that is too little, the stroke or bore that would leave
 * room. Figures to change to are rounded up, so that they are enough by this bound; other limits (coil bind, free
 * length, buckling) may ask for more.
 */
public final class StrengthBoundWords {
    private StrengthBoundWords() {
    }

    /**
     * The bound to show with a diagnosis: always when no spring is strong enough; otherwise only when the requirement
     * sets no force or deceleration limit (a limit already says what force is allowed, and {@code LimitConflict}
     * compares it with the least needed).
     */
    public static Optional<StrengthBound> shown(Diagnosis d, Requirement req) {
        boolean forceLimit = req.limits().peakForce().isPresent()
                || req.job() instanceof Arrest && req.limits().deceleration().isPresent();
        return d.strength().filter(b -> b.beyondCapacity() || !forceLimit);
    }

    public static String describe(StrengthBound b, Requirement req, DisplayUnits u) {
        String stroke = u.lenWithUnit(req.limits().stroke());
        boolean arrest = req.job() instanceof Arrest;
        StringBuilder sb = new StringBuilder();
        sb.append(arrest ? "Stopping the load within limits.stroke " + stroke + " takes a peak force of at least "
                        : "Throwing the payload from limits.stroke " + stroke + " takes a cocking force of at least ")
                .append(force(b.leastForce(), u, true))
                .append(arrest ? b.preloaded() ? " (with preload from the pocket: kinetic energy / stroke + push)"
                        : " (with no preload: 2 x (kinetic energy + push x stroke) / stroke)"
                        : " (cocked from its free length: 2 x stored energy / stroke)");
        String strongest = b.strongest().material().key() + " " + b.strongest().ends().key() + ", d "
                + u.wireWithUnit(b.strongest().wireDiameter()) + " at OD "
                + u.lenWithUnit(b.meanDiameter() + b.strongest().wireDiameter());
        if (!b.beyondCapacity()) {
            return sb.append("; the strongest spring that fits takes up to ").append(force(b.capacity(), u, false))
                    .append(" within its allowable stress (").append(strongest).append("), so wire strength alone does"
                            + " not rule the job out: the limits below do").toString();
        }
        sb.append(", but the strongest spring that fits takes at most ").append(force(b.capacity(), u, false))
                .append(" within its allowable stress (").append(strongest).append(")");
        List<String> changes = new ArrayList<>();
        String pocket = "preload from a pocket: envelope.pocket_length shorter than the free length";
        if (Double.isFinite(b.strokeNeeded())) {
            changes.add("limits.stroke at least " + length(b.strokeNeeded(), u) + (Double.isFinite(b.strokeWithPreload())
                    ? " (" + length(b.strokeWithPreload(), u) + " with " + pocket + ")" : ""));
        } else if (Double.isFinite(b.strokeWithPreload())) {
            changes.add("limits.stroke at least " + length(b.strokeWithPreload(), u) + " with " + pocket);
        }
        if (Double.isFinite(b.boreNeeded())) {
            changes.add("envelope.bore at least " + length(b.boreNeeded(), u));
        }
        if (changes.isEmpty()) {
            sb.append(": no stroke is long enough while the push on the load needs that much force on its own");
        } else {
            sb.append(": allow ").append(String.join(", or ", changes)).append(" (other limits may ask for more)");
        }
        if (req.envelope().bore().isPresent() && !Double.isFinite(b.boreNeeded())) {
            sb.append("; a larger bore alone would not do (the wire sizes, materials and spring.index cap the force)");
        } else if (req.envelope().bore().isEmpty()) {
            sb.append("; otherwise only a thicker wire or a stronger material than the design space holds would do");
        }
        return sb.toString();
    }

    private static String force(double n, DisplayUnits u, boolean roundUp) {
        return (roundUp ? LimitConflictWords.up(u.force(n)) : DisplayUnits.sig(u.force(n))) + " " + u.forceUnit();
    }

    private static String length(double m, DisplayUnits u) {
        return LimitConflictWords.up(u.length(m)) + " " + u.lengthUnit();
    }
}
