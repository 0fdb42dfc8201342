package dev.coilwise.report.html;

import static dev.coilwise.report.DisplayUnits.fmt;
import static dev.coilwise.report.DisplayUnits.sig;

import dev.coilwise.report.DisplayUnits;
import java.util.ArrayList;
import java.util.List;

/**
 * Restates a saved requirement in plain sentences, each figure with its unit, in the requirement's own unit system.
 * Read from the shortlist's {@code requirement} object so that a saved shortlist renders the same words.
 */
final class RequirementWords {
    private RequirementWords() {
    }

    static List<String> sentences(JsonIn req, DisplayUnits u) {
        List<String> out = new ArrayList<>();
        boolean arrest = "arrest".equals(req.text("job"));
        double mass = req.object("load").number("mass_kg");
        JsonIn lim = req.object("limits");
        double stroke = lim.mm("stroke_mm");
        if (arrest) {
            JsonIn m = req.object("motion");
            StringBuilder s = new StringBuilder("Stop a load of ").append(mass(mass, u)).append(" that meets the spring at ")
                    .append(sig(u.speed(m.number("contact_speed_m_per_s")))).append(' ').append(u.speedUnit());
            double drop = m.optionalNumber("drop_height_mm");
            if (!Double.isNaN(drop)) {
                s.append(" after a ").append(u.lenWithUnit(drop * 1e-3)).append(" drop");
            }
            s.append(", ").append(direction(m.number("direction_deg_below_horizontal")));
            double push = m.optionalNumber("drive_force_N");
            if (push > 0) {
                s.append(", pushed on by ").append(u.forceWithUnit(push));
            }
            s.append(". The spring may compress at most ").append(u.lenWithUnit(stroke)).append(" while stopping it.");
            out.add(s.toString());
        } else {
            JsonIn l = req.object("launch");
            double angle = l.number("direction_deg_above_horizontal");
            out.add("Throw a payload of " + mass(mass, u) + ", released from rest on the cocked spring, so that it rises "
                    + u.lenWithUnit(l.mm("height_mm")) + " above the muzzle (the spring's free-length top), launched "
                    + (Math.abs(angle - 90) < 0.5 ? "straight up" : fmt("%.0f deg above the horizontal", angle))
                    + "; it must leave at " + sig(u.speed(l.number("exit_speed_needed_m_per_s"))) + " " + u.speedUnit()
                    + ". " + losses(l.number("losses_pct")) + " The spring may be cocked at most "
                    + u.lenWithUnit(stroke) + ".");
        }
        List<String> limits = new ArrayList<>();
        double force = lim.optionalNumber("peak_force_N");
        if (!Double.isNaN(force)) {
            limits.add((arrest ? "peak force" : "cocking force") + " at most " + u.forceWithUnit(force));
        }
        double decel = lim.optionalNumber("deceleration_gn");
        if (!Double.isNaN(decel)) {
            limits.add("deceleration of the load at most " + sig(decel) + " gn");
        }
        if (!limits.isEmpty()) {
            out.add(capital(String.join("; ", limits)) + ".");
        }
        envelope(req.object("envelope"), u).ifPresentOrElse(out::add, () -> out.add("No envelope: any size will do."));
        out.add(springRules(req.object("spring"), u));
        JsonIn rank = req.object("ranking");
        out.add("Designs are ranked by " + rank.text("by").replace('_', ' ') + " (smaller first); the best "
                + rank.integer("shortlist") + " are kept, at most one per material, end type and wire diameter.");
        return out;
    }

    private static java.util.Optional<String> envelope(JsonIn en, DisplayUnits u) {
        List<String> parts = new ArrayList<>();
        String clearance = en.has("clearance_mm")
                ? u.lenWithUnit(en.mm("clearance_mm")) + " diametral clearance"
                : fmt("%.0f", en.optionalNumber("clearance_pct")) + " % diametral clearance";
        double bore = en.optionalNumber("bore_mm");
        double rod = en.optionalNumber("rod_mm");
        if (!Double.isNaN(bore)) {
            parts.add("works inside a " + u.lenWithUnit(bore * 1e-3) + " bore");
        }
        if (!Double.isNaN(rod)) {
            parts.add("works over a " + u.lenWithUnit(rod * 1e-3) + " rod");
        }
        if (!parts.isEmpty()) {
            parts.set(parts.size() - 1, parts.get(parts.size() - 1) + " with " + clearance);
        }
        double maxL0 = en.optionalNumber("max_free_length_mm");
        if (!Double.isNaN(maxL0)) {
            parts.add("free length at most " + u.lenWithUnit(maxL0 * 1e-3));
        }
        double pocket = en.optionalNumber("pocket_length_mm");
        if (!Double.isNaN(pocket)) {
            parts.add("installed in a " + u.lenWithUnit(pocket * 1e-3)
                    + " pocket (a free length above it gives preload)");
        }
        return parts.isEmpty() ? java.util.Optional.empty()
                : java.util.Optional.of("The spring " + String.join("; ", parts) + ".");
    }

    private static String springRules(JsonIn sp, DisplayUnits u) {
        List<String> mats = sp.texts("materials");
        double[] index = sp.numbers("index");
        double[] coils = sp.numbers("active_coils");
        StringBuilder s = new StringBuilder("Searched ")
                .append(mats.isEmpty() ? "every steel of the material table" : String.join(", ", mats))
                .append(" with ").append(String.join(" or ", sp.texts("ends"))).append(" ends, ")
                .append(sp.text("wire_series")).append(" wire sizes, spring index ")
                .append(range(index)).append(" and ").append(range(coils)).append(" active coils. ");
        s.append("Free length less solid length must be at least ")
                .append(fmt("%.2f", 1 + sp.number("clash_allowance_pct") / 100))
                .append(" times the largest deflection (coil-bind allowance); ");
        s.append(sp.flag("solid_safe") ? "the stress at solid must stay within the allowable"
                : "the spring may be over-stressed at solid, so it must never reach solid");
        s.append(sp.flag("set_removed") ? "; set removed" : "; not set removed");
        s.append("; ends seated ").append(sp.text("seating")).append(" for buckling");
        double cycles = sp.optionalNumber("cycles");
        s.append(Double.isNaN(cycles) ? "; static duty." : fmt("; %.3g load cycles%s.", cycles,
                sp.flag("shot_peened") ? ", shot peened" : ""));
        return s.toString();
    }

    private static String losses(double pct) {
        return pct > 0 ? "Guide friction loses " + fmt("%.0f", pct) + " % of the stored energy."
                : "No loss to guide friction is assumed.";
    }

    private static String range(double[] r) {
        return r.length == 2 ? sig(r[0]) + " to " + sig(r[1]) : "-";
    }

    private static String mass(double kg, DisplayUnits u) {
        return sig(u.loadMass(kg)) + " " + u.loadMassUnit();
    }

    private static String direction(double degBelow) {
        if (Math.abs(degBelow - 90) < 0.5) {
            return "falling straight down";
        }
        if (Math.abs(degBelow) < 0.5) {
            return "moving horizontally";
        }
        return degBelow > 0 ? fmt("moving %.0f deg below the horizontal", degBelow)
                : fmt("moving %.0f deg above the horizontal", -degBelow);
    }

    private static String capital(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
