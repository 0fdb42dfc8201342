package dev.coilwise.mechanics;

import dev.coilwise.model.Arrest;
import dev.coilwise.model.Envelope;
import dev.coilwise.model.Launch;
import dev.coilwise.model.Limits;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import dev.coilwise.model.SpringOptions;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Evaluates one spring against one requirement: the energy balance of the job, then every limit as a {@link Margin}.
 * Pure and thread-safe.
 *
 * <p>Margin keys: {@code stroke, peak_force, deceleration, coil_bind, stress_working, stress_solid, index,
 * active_coils, fit_bore, fit_rod, free_length, pocket, buckling, surge, fatigue}. The fatigue margin (actual = the
 * fatigue safety factor, required = {@code spring.fatigue_margin}) is added only when {@code spring.cycles} is at least
 * {@link Fatigue#STATIC_BELOW}. A design is feasible when every hard margin
 * holds. Buckling is hard only when neither bore nor rod guides the spring; stress at solid is hard only when
 * {@code solid_safe}.
 */
public final class DesignEvaluator {

    private DesignEvaluator() {
    }

    /**
     * Evaluates a spring against a requirement.
     *
     * <p>Arrest: the preload deflection is L0 − pocket length (when a pocket is given and shorter than L0); the
     * working deflection is the root of the arrest balance; peak force F0 + k·x. Launch: the working deflection is
     * the cocked compression that throws the payload to the required height; the peak force is the cocking force.
     * Each margin is {@code (allowed − actual)/|allowed|} for an upper limit and {@code (actual − required)/|required|}
     * for a lower one: positive is spare, negative is over.
     *
     * @param s   the spring as ordered
     * @param req the requirement (job, limits, envelope and design rules)
     * @return every working figure and margin; never null
     */
    public static Evaluation evaluate(Spring s, Requirement req) {
        SpringOptions opt = req.spring();
        Envelope env = req.envelope();
        Limits lim = req.limits();
        double k = s.rate();
        double sut = s.tensileStrength();
        double allow = s.material().allowableStress(s.wireDiameter(), opt.setRemoved());
        double d = s.wireDiameter();
        double dm = s.meanDiameter();
        List<Margin> m = new ArrayList<>();

        double preloadDefl = 0;
        double work;
        double peak;
        double decel = Double.NaN;
        double speed;
        double height = Double.NaN;
        if (req.job() instanceof Arrest a) {
            if (env.pocketLength().isPresent()) {
                preloadDefl = Math.max(0, s.freeLength() - env.pocketLength().getAsDouble());
            }
            double f0 = k * preloadDefl;
            work = ArrestBalance.maxCompression(k, a.mass(), a.contactSpeed(), a.pushForce(), f0);
            peak = ArrestBalance.peakForce(k, f0, work);
            decel = ArrestBalance.peakDeceleration(peak, a.pushForce(), a.mass());
            speed = a.contactSpeed();
            if (lim.deceleration().isPresent()) {
                m.add(Margin.atMost("deceleration", decel, lim.deceleration().getAsDouble(), "m/s^2", true));
            }
            env.pocketLength().ifPresent(p -> m.add(Margin.atLeast("pocket", s.freeLength(), p, "m", true)));
        } else {
            Launch l = (Launch) req.job();
            work = LaunchBalance.cockedCompression(k, l.height(), l.mass(), s.activeMass(), l.angle(), l.efficiency());
            peak = k * work;
            speed = LaunchBalance.exitSpeed(k, work, l.mass(), s.activeMass(), l.angle(), l.efficiency());
            height = LaunchBalance.apexRise(speed, l.angle());
        }
        double total = preloadDefl + work;
        m.add(0, Margin.atMost("stroke", work, lim.stroke(), "m", true));
        lim.peakForce().ifPresent(v -> m.add(1, Margin.atMost("peak_force", peak, v, "N", true)));

        double xi = opt.clashAllowance();
        m.add(Margin.atMost("coil_bind", total, s.deflectionToSolid() / (1 + xi), "m", true));
        double tauWork = Stress.corrected(peak, dm, d);
        double tauSolid = Stress.corrected(k * s.deflectionToSolid(), dm, d);
        m.add(Margin.atMost("stress_working", tauWork, allow, "Pa", true));
        m.add(Margin.atMost("stress_solid", tauSolid, allow, "Pa", opt.solidSafe()));
        double c = s.index();
        m.add(new Margin("index", Math.min((c - opt.indexMin()) / opt.indexMin(), (opt.indexMax() - c) / opt.indexMax()),
                c, c < opt.indexMin() ? opt.indexMin() : opt.indexMax(), "", true));
        double na = s.activeCoils();
        m.add(new Margin("active_coils", Math.min((na - opt.coilsMin()) / opt.coilsMin(),
                (opt.coilsMax() - na) / opt.coilsMax()), na, na < opt.coilsMin() ? opt.coilsMin() : opt.coilsMax(), "", true));

        double odSolid = SolidGrowth.outerDiameterAtSolid(s);
        env.bore().ifPresent(b -> m.add(Margin.atMost("fit_bore", odSolid, b - env.clearance().of(b), "m", true)));
        env.rod().ifPresent(r -> m.add(Margin.atLeast("fit_rod", s.innerDiameter(), r + env.clearance().of(r), "m", true)));
        env.maxFreeLength().ifPresent(v -> m.add(Margin.atMost("free_length", s.freeLength(), v, "m", true)));

        double ycr = Buckling.criticalDeflection(s, opt.seating());
        m.add(ycr == Double.POSITIVE_INFINITY
                ? new Margin("buckling", Double.POSITIVE_INFINITY, total, ycr, "m", !env.guided())
                : Margin.atMost("buckling", total, ycr, "m", !env.guided()));

        double vLim = Surge.speedLimit(allow, s.material().density(), s.shearModulus());
        m.add(Margin.atMost("surge", speed, vLim, "m/s", true));

        Optional<FatigueCheck> fatigue = Optional.empty();
        if (opt.cycles().isPresent() && opt.cycles().getAsDouble() >= Fatigue.STATIC_BELOW) {
            FatigueCheck f = Fatigue.check(s, k * preloadDefl, peak, opt.cycles().getAsDouble(), opt.shotPeened(), allow);
            m.add(Margin.atLeast("fatigue", f.safetyFactor(), opt.fatigueMargin(), "", true));
            fatigue = Optional.of(f);
        }

        double mass = s.mass();
        return new Evaluation(s, req.job().key(), k, k * preloadDefl, preloadDefl, work, total, peak, decel, speed,
                height, tauWork, tauSolid, sut, allow, odSolid, ycr, Surge.frequencyFixedFixed(s), vLim, mass,
                mass * s.material().relativeCost(), m, fatigue);
    }
}
