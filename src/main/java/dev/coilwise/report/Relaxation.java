package dev.coilwise.report;

import dev.coilwise.mechanics.Margin;
import dev.coilwise.model.Requirement;

/** Says in the designer's words what would have to change for a failed limit to hold. */
public final class Relaxation {
    private Relaxation() {
    }

    public static String describe(Margin m, Requirement req, DisplayUnits u) {
        double a = m.actual();
        double shortfall = a - m.allowed();
        return switch (m.key()) {
            case "stroke" -> "allow " + u.lenWithUnit(a) + " stroke (limits.stroke)";
            case "peak_force" -> "allow " + u.forceWithUnit(a) + " peak force (limits.peak_force)";
            case "deceleration" -> "allow " + DisplayUnits.sig(DisplayUnits.gn(a)) + " gn deceleration (limits.deceleration)";
            case "fit_bore" -> "allow a " + u.lenWithUnit(req.envelope().bore().orElse(0) + shortfall) + " bore (envelope.bore)";
            case "fit_rod" -> "allow a " + u.lenWithUnit(req.envelope().rod().orElse(0) + shortfall) + " rod (envelope.rod)";
            case "free_length" -> "allow " + u.lenWithUnit(a) + " free length (envelope.max_free_length)";
            case "pocket" -> "allow a free length below the pocket (envelope.pocket_length " + u.lenWithUnit(m.allowed()) + ")";
            case "coil_bind" -> "allow " + u.lenWithUnit(shortfall * (1 + req.spring().clashAllowance()))
                    + " more length to solid (envelope.max_free_length or spring.clash_allowance)";
            case "stress_working" -> "working stress " + u.stressWithUnit(a) + " exceeds the allowable "
                    + u.stressWithUnit(m.allowed()) + " (a stronger wire, spring.set_removed: true, or a longer stroke)";
            case "stress_solid" -> "stress at solid " + u.stressWithUnit(a) + " exceeds the allowable "
                    + u.stressWithUnit(m.allowed()) + " (spring.solid_safe: false if a solid stop can never be reached)";
            case "buckling" -> "guide the spring with a bore or rod, or seat it flat at both ends (spring.seating)";
            case "surge" -> "the end speed " + DisplayUnits.sig(u.speed(a)) + " " + u.speedUnit()
                    + " exceeds the surge limit " + DisplayUnits.sig(u.speed(m.allowed())) + " " + u.speedUnit()
                    + " of this wire";
            case "index" -> "widen spring.index to include " + DisplayUnits.sig(a);
            case "active_coils" -> "widen spring.active_coils to include " + DisplayUnits.sig(a);
            case "fatigue" -> "fatigue safety factor " + DisplayUnits.sig(a) + " below " + DisplayUnits.sig(m.allowed())
                    + " (shot peening, fewer cycles or a lower working stress)";
            default -> m.key() + " short by " + DisplayUnits.sig(-m.value() * 100) + " %";
        };
    }
}
