package dev.coilwise.search;

import dev.coilwise.model.Arrest;
import dev.coilwise.model.Gravity;
import dev.coilwise.model.Launch;
import dev.coilwise.model.Requirement;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;

/**
 * A force limit that no helical compression spring can meet within the stroke, whatever its material, size or ends:
 * a bound from the work-energy balance alone, found before any search.
 *
 * <p>A helical compression spring is linear, F = F0 + k·x. Arrest: the spring must take the load's kinetic energy E
 * plus the work of the constant push Fc over its compression x ≤ s (stroke). With no preload (F0 = 0), ½·F·x =
 * E + Fc·x, so the peak force is at least F = 2E/s + 2Fc. With preload from a pocket, the force can be nearly
 * constant and the peak is at least F = E/s + Fc (the limit of a soft spring with a large preload). Launch: the spring
 * is cocked from its free length (no preload) and must store E = (½·m·v² + m·gn·sin φ·s)/(1 − losses), so the cocking
 * force is at least 2E/s. The spring's own mass only adds to what is needed, so each figure is a true lower bound
 * (Shigley's Mechanical Engineering Design, 9th ed., Sec. 10-7, spring rate and stored energy ½·k·x²; the balances of
 * {@link dev.coilwise.mechanics.ArrestBalance} and {@link dev.coilwise.mechanics.LaunchBalance}).
 *
 * @param limit        {@code peak_force} or {@code deceleration}
 * @param allowed      the limit as given, SI (N or m/s²)
 * @param leastNeeded  the least value any spring reaches within the stroke, SI (N or m/s²)
 * @param strokeNeeded the shortest stroke at which the limit as given could be met, m; NaN when no stroke would do
 * @param preloaded    whether the bound counts on preload (an arrest with a pocket)
 * @param withPreload  arrest without a pocket: the least value with preload from a pocket, SI; NaN otherwise
 */
public record LimitConflict(String limit, double allowed, double leastNeeded, double strokeNeeded, boolean preloaded,
                            double withPreload) {

    /** Every force limit of {@code req} that no spring can meet; empty when the balance alone rules nothing out. */
    public static List<LimitConflict> of(Requirement req) {
        List<LimitConflict> out = new ArrayList<>();
        double s = req.limits().stroke();
        OptionalDouble peak = req.limits().peakForce();
        if (req.job() instanceof Arrest a) {
            boolean pocket = req.envelope().pocketLength().isPresent();
            double e = a.kineticEnergy();
            double fc = a.pushForce();
            double least = pocket ? e / s + fc : 2 * e / s + 2 * fc;
            double preload = pocket ? Double.NaN : e / s + fc;
            if (least <= 0) {
                return out; // the push alone stops the load (moving up against gravity): no force is needed
            }
            if (peak.isPresent() && peak.getAsDouble() < least) {
                out.add(new LimitConflict("peak_force", peak.getAsDouble(), least, arrestStroke(e, fc, peak.getAsDouble(), pocket),
                        pocket, preload));
            }
            OptionalDouble decel = req.limits().deceleration();
            if (decel.isPresent()) {
                double force = a.mass() * decel.getAsDouble() + fc; // the spring force at that deceleration
                if (force < least) {
                    out.add(new LimitConflict("deceleration", decel.getAsDouble(), (least - fc) / a.mass(),
                            arrestStroke(e, fc, force, pocket), pocket, pocket ? Double.NaN : (preload - fc) / a.mass()));
                }
            }
        } else if (req.job() instanceof Launch l && peak.isPresent()) {
            double v = l.requiredExitSpeed();
            double kinetic = 0.5 * l.mass() * v * v;
            double lift = l.mass() * Gravity.STANDARD * Math.sin(l.angle());
            double eta = l.efficiency();
            double least = 2 * (kinetic + lift * s) / eta / s;
            if (peak.getAsDouble() < least) {
                double room = peak.getAsDouble() * eta / 2 - lift;
                out.add(new LimitConflict("peak_force", peak.getAsDouble(), least, room > 0 ? kinetic / room : Double.NaN,
                        false, Double.NaN));
            }
        }
        return out;
    }

    /** Arrest: the stroke at which a peak force {@code f} suffices; NaN when the push leaves no room at any stroke. */
    static double arrestStroke(double e, double fc, double f, boolean pocket) {
        double room = pocket ? f - fc : f - 2 * fc;
        return room > 0 ? (pocket ? e : 2 * e) / room : Double.NaN;
    }
}
