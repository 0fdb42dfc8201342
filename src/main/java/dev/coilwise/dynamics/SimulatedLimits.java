package dev.coilwise.dynamics;

import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.mechanics.Fatigue;
import dev.coilwise.mechanics.FatigueCheck;
import dev.coilwise.mechanics.Stress;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.Launch;
import dev.coilwise.model.Limits;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import dev.coilwise.model.SpringOptions;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * What {@code ranking.dynamics: strict} asks: whether the simulated event meets every hard limit of the requirement
 * when the limits are read with the simulated figures instead of the energy balance's. The design itself is already
 * feasible by the balance ({@link dev.coilwise.mechanics.DesignEvaluator}); geometric limits (fit, free length,
 * index, coils, buckling, stress at solid) do not depend on the event and are not repeated here. Pure.
 *
 * <p>The rules, each named by the evaluator's margin key where it has one:
 * <ul>
 *   <li>{@code event}: the simulated event ended within the simulated time (else its figures prove nothing).</li>
 *   <li>{@code stroke}: simulated maximum compression ≤ {@code limits.stroke}. Arrest: the load's travel from first
 *       contact, with or without a pocket, as the evaluator counts the stroke; launch: the cocked compression.</li>
 *   <li>{@code peak_force}: simulated peak force (arrest; the force between spring and load, coil contact
 *       included) or cocking force (launch) ≤ {@code limits.peak_force}.</li>
 *   <li>{@code deceleration} (arrest): (simulated peak force − constant push)/mass ≤ {@code limits.deceleration}.
 *       The load's only varying force is the spring's, so this is exactly its simulated peak deceleration.</li>
 *   <li>{@code stress_working}: simulated peak stress (any element, from its own wire force) ≤ the allowable. This
 *       also covers surge: the simulation models the stress wave the evaluator's surge limit guards against.</li>
 *   <li>{@code coil_bind}: unless the requirement lets the spring reach solid ({@code spring.clash_allowance} 0 %
 *       with {@code spring.solid_safe: true}), no element may clash, and the simulated total deflection (preload +
 *       maximum compression) must leave the clash allowance: ≤ (L0 − Ls)/(1 + ξ), the evaluator's rule. When solid
 *       is allowed, a clash stays a warning and its force and stress are held by the rules above.</li>
 *   <li>{@code fatigue} (when the evaluator checks fatigue, {@code spring.cycles} ≥ 10⁴): the fatigue safety factor
 *       between the preload and the simulated peak stress ≥ {@code spring.fatigue_margin}.</li>
 *   <li>{@code launch_exit}: the payload leaves the guide.</li>
 *   <li>{@code launch_height}: the simulated apex rise lies within the {@link ApexBand} around
 *       {@code launch.height}, the band the Monte Carlo counts made springs against.</li>
 * </ul>
 * Differences from the energy balance and a load lighter than the coils stay warnings ({@link DynamicsFlags}): they
 * explain the figures; only the figures against the limits decide.
 */
public final class SimulatedLimits {
    private SimulatedLimits() {
    }

    /** Whether the requirement lets the coils close: no clash allowance and a wire that is safe at solid. */
    public static boolean solidAllowed(SpringOptions opt) {
        return opt.clashAllowance() == 0 && opt.solidSafe();
    }

    /**
     * The hard limits the simulated event breaks, in the order of the class comment; empty when it meets them all.
     *
     * @param s    the simulation summary
     * @param e    the energy balance of the same spring and requirement
     * @param req  the requirement (limits, design rules and units of the words)
     * @param band the launch band (ignored for an arrest)
     */
    public static List<LimitBreach> breaches(SimulationSummary s, Evaluation e, Requirement req, ApexBand band) {
        ShownUnits u = new ShownUnits(req.units());
        Limits lim = req.limits();
        boolean arrest = req.job() instanceof Arrest;
        List<LimitBreach> out = new ArrayList<>();
        if (Double.isNaN(arrest ? s.reboundSpeed() : s.exitSpeed())) {
            out.add(new LimitBreach("event", Double.NaN, Double.NaN, "the simulated event did not end within the"
                    + " simulated time, so its figures cannot show that the limits hold"));
        }
        String len = u.lengthUnit();
        over(out, "stroke", s.maxCompression(), lim.stroke(), arrest ? "maximum compression" : "cocked compression",
                "limits.stroke", u.length(1), len);
        if (lim.peakForce().isPresent()) {
            over(out, "peak_force", s.peakForce(), lim.peakForce().getAsDouble(),
                    arrest ? "peak force" : "cocking force", "limits.peak_force", u.force(1), u.forceUnit());
        }
        if (req.job() instanceof Arrest a && lim.deceleration().isPresent()) {
            over(out, "deceleration", (s.peakForce() - a.pushForce()) / a.mass(), lim.deceleration().getAsDouble(),
                    "peak deceleration", "limits.deceleration", ShownUnits.gn(1), "gn");
        }
        over(out, "stress_working", s.peakStress(), e.allowableStress(), "peak stress",
                "the allowable", u.stress(1), u.stressUnit());
        coilBind(out, s, e, req.spring(), u);
        fatigue(out, s, e, req.spring());
        if (req.job() instanceof Launch l) {
            launch(out, s, l, band, u);
        }
        return out;
    }

    private static void coilBind(List<LimitBreach> out, SimulationSummary s, Evaluation e, SpringOptions opt,
                                 ShownUnits u) {
        if (solidAllowed(opt)) {
            return;
        }
        String allowance = "spring.clash_allowance " + num(100 * opt.clashAllowance()) + " %"
                + (opt.clashAllowance() == 0 ? " with spring.solid_safe: false" : "");
        if (s.coilClash()) {
            out.add(new LimitBreach("coil_bind", Double.NaN, Double.NaN, fmt("coils clash in the simulation (element"
                    + " %d of %d, %.2f ms into the event), and %s keeps them apart", s.firstClashElement(),
                    s.masses() + 1, s.firstClashTime() * 1e3, allowance)));
        }
        Spring sp = e.spring();
        double total = e.preloadDeflection() + s.maxCompression();
        double allowed = sp.deflectionToSolid() / (1 + opt.clashAllowance());
        if (total > allowed) {
            out.add(new LimitBreach("coil_bind", total, allowed, fmt("simulated total deflection %s %s exceeds the"
                            + " %s %s that %s leaves of the %s %s to solid, by %s", num(u.length(total)),
                    u.lengthUnit(), num(u.length(allowed)), u.lengthUnit(), allowance,
                    num(u.length(sp.deflectionToSolid())), u.lengthUnit(), by(total, allowed))));
        }
    }

    private static void fatigue(List<LimitBreach> out, SimulationSummary s, Evaluation e, SpringOptions opt) {
        if (e.fatigue().isEmpty() || opt.cycles().isEmpty() || Double.isNaN(s.peakStress())) {
            return;
        }
        Spring sp = e.spring();
        double fMax = Math.max(e.preloadForce(), Stress.forceFor(s.peakStress(), sp.meanDiameter(),
                sp.wireDiameter()));
        FatigueCheck f = Fatigue.check(sp, e.preloadForce(), fMax, opt.cycles().getAsDouble(), opt.shotPeened(),
                e.allowableStress());
        if (f.safetyFactor() < opt.fatigueMargin()) {
            out.add(new LimitBreach("fatigue", f.safetyFactor(), opt.fatigueMargin(), fmt("fatigue safety factor %s"
                            + " at the simulated peak stress is below spring.fatigue_margin %s (%s cycles)",
                    num(f.safetyFactor()), num(opt.fatigueMargin()), num(opt.cycles().getAsDouble()))));
        }
    }

    private static void launch(List<LimitBreach> out, SimulationSummary s, Launch l, ApexBand band, ShownUnits u) {
        if (Double.isNaN(s.exitSpeed())) {
            return;
        }
        String len = u.lengthUnit();
        if (s.exitSpeed() == 0) {
            out.add(new LimitBreach("launch_exit", s.apex(), 0, fmt("the payload does not leave the guide in the"
                    + " simulation: it comes to rest %s %s below the muzzle", num(u.length(-s.apex()
                    / Math.sin(l.angle()))), len)));
            return;
        }
        double lo = band.lowest(l.height());
        double hi = band.highest(l.height());
        if (s.apex() >= lo && s.apex() <= hi) {
            return;
        }
        boolean shortfall = s.apex() < lo;
        String accepted = Double.isInfinite(hi) ? fmt("at least %s %s", num(u.length(lo)), len)
                : fmt("%s to %s %s", num(u.length(lo)), num(u.length(hi)), len);
        out.add(new LimitBreach("launch_height", s.apex(), shortfall ? lo : hi, fmt("simulated apex rise %s %s %s"
                        + " launch.height %s %s by %s; the launch band accepts %s", num(u.length(s.apex())), len,
                shortfall ? "falls short of" : "overshoots", num(u.length(l.height())), len,
                pct(Math.abs(s.apex() - l.height()) / l.height()), accepted)));
    }

    /** Adds a breach when {@code simulated} exceeds {@code allowed}. */
    private static void over(List<LimitBreach> out, String key, double simulated, double allowed, String figure,
                             String limit, double scale, String unit) {
        if (simulated > allowed) {
            out.add(new LimitBreach(key, simulated, allowed, fmt("simulated %s %s %s exceeds %s %s %s by %s", figure,
                    num(simulated * scale), unit, limit, num(allowed * scale), unit, by(simulated, allowed))));
        }
    }

    private static String by(double simulated, double allowed) {
        return pct((simulated - allowed) / allowed);
    }

    private static String pct(double fraction) {
        return fraction < 0.0005 ? "less than 0.1 %" : fmt("%.1f %%", 100 * fraction);
    }

    /** Four significant digits, written out in full (no exponent): 2105, 30.12, 0.8125. */
    static String num(double v) {
        if (!Double.isFinite(v)) {
            return Double.isNaN(v) ? "-" : v > 0 ? "inf" : "-inf";
        }
        return new BigDecimal(v).round(new MathContext(4)).stripTrailingZeros().toPlainString();
    }

    private static String fmt(String format, Object... args) {
        return String.format(Locale.ROOT, format, args);
    }
}
