package dev.coilwise.search;

import dev.coilwise.mechanics.Stress;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.Clearance;
import dev.coilwise.model.Envelope;
import dev.coilwise.model.Gravity;
import dev.coilwise.model.Launch;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.SpringOptions;
import java.util.Optional;

/**
 * What the work-energy balance asks of any spring, set against the strongest spring the design space holds: a bound
 * found without a search that holds whether or not the requirement sets a force or deceleration limit.
 *
 * <p>Least force. A helical compression spring is linear, F = F0 + k·x, and stores ½·(F0 + F)·x over a compression
 * x. Arrest: it must take the load's kinetic energy E plus the work of the constant push Fc over x ≤ s (the stroke);
 * with no preload ½·F·x = E + Fc·x, so the peak force is at least 2E/s + 2Fc; with preload from a pocket at least
 * E/s + Fc (a soft spring with a large preload). Launch: cocked from its free length, the spring must store
 * (½·m·v² + m·gn·sin φ·s)/η, so the cocking force is at least 2·(½·m·v² + m·gn·sin φ·s)/(η·s). The spring's own mass
 * only adds to what is needed. (Spring energy ½·k·x²: Shigley's Mechanical Engineering Design, 9th ed., Sec. 10-7;
 * the work-energy balance of a load stopped by a spring: Gere, Mechanics of Materials, Sec. 2.8 "Impact
 * loading"; both from memory. The same bounds as {@link LimitConflict}.)
 *
 * <p>Capacity. A spring of wire d and mean diameter D reaches its allowable corrected stress τa at the force
 * F = τa·π·d³/(8·K_B·D) ({@link Stress#forceFor}); its peak force may not pass that (stress at the working
 * deflection), nor, when {@code spring.solid_safe} holds, that force divided by 1 + ξ (the solid force reaches at most
 * the allowable stress and the total deflection stays a share 1/(1 + ξ) of the travel to solid, ξ the clash
 * allowance). D·K_B(D/d) = d·C·(4C + 2)/(4C − 3) rises with C for C above 1.72 and the spring index is at least 2,
 * so F falls as D grows and each family is strongest at the smallest mean diameter it may have: D ≥ C_min·d, and
 * D ≥ rod + clearance + d with a rod (a family whose wire then has no index up to C_max is left out). With a bore, D + d ≤ bore − clearance (the outer diameter only grows towards
 * solid). Over every family (material × ends × wire) the largest such force is an upper bound on the peak force of
 * any spring that meets the stress limits and fits the envelope.
 *
 * @param leastForce   least peak force (arrest) or cocking force (launch) of any spring that does the job within
 *                     {@code limits.stroke}, N
 * @param preloaded    whether {@code leastForce} counts on preload (an arrest with a pocket)
 * @param capacity     the largest peak force any spring of the design space takes within its allowable stress, N
 * @param strongest    the family that takes it
 * @param meanDiameter the mean diameter at which it does, m
 * @param strokeNeeded when the capacity is below the least force: the shortest stroke at which it would do, m; NaN
 *                     otherwise, or when the push on the load needs more than the capacity at any stroke
 * @param boreNeeded   when the capacity is below the least force and a bore is given: the smallest bore that leaves
 *                     room for a spring of the design space to take the least force, m; NaN otherwise, or when no
 *                     bore would do (the wire sizes and index limits cap the force first)
 * @param strokeWithPreload when the capacity is below the least force of an arrest without a pocket: the shortest
 *                     stroke at which it would do with preload from a pocket, m; NaN otherwise or when none would
 */
public record StrengthBound(double leastForce, boolean preloaded, double capacity, Family strongest,
                            double meanDiameter, double strokeNeeded, double boreNeeded, double strokeWithPreload) {

    /** Whether no spring of the design space can take the force the job needs within the stroke. */
    public boolean beyondCapacity() {
        return capacity < leastForce;
    }

    /** The bound for the design space of a requirement; empty when the job needs no force or the space is empty. */
    public static Optional<StrengthBound> of(DesignSpace space) {
        Requirement req = space.requirement();
        double s = req.limits().stroke();
        double least;
        boolean pocket = false;
        if (req.job() instanceof Arrest a) {
            pocket = req.envelope().pocketLength().isPresent();
            double e = a.kineticEnergy();
            double fc = a.pushForce();
            least = pocket ? e / s + fc : 2 * e / s + 2 * fc;
        } else {
            Launch l = (Launch) req.job();
            least = 2 * (kinetic(l) + lift(l) * s) / (l.efficiency() * s);
        }
        if (!(least > 0)) {
            return Optional.empty(); // the push alone stops the load: no spring force is needed
        }
        Family best = null;
        double capacity = 0;
        double bestD = Double.NaN;
        double boreNeeded = Double.POSITIVE_INFINITY;
        Envelope env = req.envelope();
        double share = req.spring().solidSafe() ? 1 + req.spring().clashAllowance() : 1;
        for (Family f : space.families()) {
            double d = f.wireDiameter();
            double dMin = smallestMeanDiameter(d, req.spring(), env);
            if (dMin > req.spring().indexMax() * d) {
                continue; // the rod leaves this wire no index within the limits
            }
            double allow = f.material().allowableStress(d, req.spring().setRemoved());
            double force = Stress.forceFor(allow, dMin, d) / share;
            if (force >= least && env.bore().isPresent()) {
                boreNeeded = Math.min(boreNeeded, boreFor(dMin + d, env.clearance()));
            }
            boolean fits = env.bore().isEmpty() || dMin + d <= bore(env);
            if (fits && force > capacity) {
                capacity = force;
                best = f;
                bestD = dMin;
            }
        }
        if (best == null) {
            return Optional.empty();
        }
        boolean tooWeak = capacity < least;
        double stroke = tooWeak ? strokeFor(req, capacity, pocket) : Double.NaN;
        double bore = tooWeak && Double.isFinite(boreNeeded) ? boreNeeded : Double.NaN;
        double preloadStroke = tooWeak && !pocket && req.job() instanceof Arrest ? strokeFor(req, capacity, true)
                : Double.NaN;
        return Optional.of(new StrengthBound(least, pocket, capacity, best, bestD, stroke, bore, preloadStroke));
    }

    /** The smallest mean diameter of wire {@code d} that the index limits and the rod allow, m. */
    private static double smallestMeanDiameter(double d, SpringOptions opt, Envelope env) {
        double dMin = opt.indexMin() * d;
        if (env.rod().isPresent()) {
            double rod = env.rod().getAsDouble();
            dMin = Math.max(dMin, rod + env.clearance().of(rod) + d);
        }
        return dMin;
    }

    /** Room for the outer diameter in the bore, m. */
    private static double bore(Envelope env) {
        double b = env.bore().getAsDouble();
        return b - env.clearance().of(b);
    }

    /** The smallest bore whose room takes an outer diameter {@code od}, m. */
    private static double boreFor(double od, Clearance c) {
        return Double.isNaN(c.length()) ? od / (1 - c.fraction()) : od + c.length();
    }

    /** The shortest stroke at which a peak force {@code f} suffices, m; NaN when the push leaves no room. */
    private static double strokeFor(Requirement req, double f, boolean pocket) {
        if (req.job() instanceof Arrest a) {
            return LimitConflict.arrestStroke(a.kineticEnergy(), a.pushForce(), f, pocket);
        }
        Launch l = (Launch) req.job();
        double room = f * l.efficiency() / 2 - lift(l);
        return room > 0 ? kinetic(l) / room : Double.NaN;
    }

    private static double kinetic(Launch l) {
        double v = l.requiredExitSpeed();
        return 0.5 * l.mass() * v * v;
    }

    private static double lift(Launch l) {
        return l.mass() * Gravity.STANDARD * Math.sin(l.angle());
    }
}
