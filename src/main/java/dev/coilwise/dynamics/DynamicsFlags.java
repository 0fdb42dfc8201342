package dev.coilwise.dynamics;

import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.Job;
import dev.coilwise.model.Launch;
import dev.coilwise.model.UnitSystem;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Reads a simulation summary against the energy balance of the same design and says, in words, what the simulation
 * found: warnings (the design does not behave as the balance says) and notes (facts worth knowing that are no fault).
 *
 * <p>Warnings: simulated stress above the allowable; coil clash; a figure more than {@value #DEVIATION_LIMIT_PCT} %
 * from the balance; a load or payload lighter than the spring's active coils; a payload that does not leave the
 * guide; an event that did not end in the simulated time. Notes: the rebound of an arrested load. Flags never
 * disqualify a design by themselves; {@code ranking.dynamics: strict} reads the simulated figures against the
 * requirement's limits instead ({@link SimulatedLimits}).
 *
 * <p>The summary keeps its figures in SI and its flags in SI words (mm, N, MPa, kg, m/s). Outputs word them in the
 * requirement's units with {@link #warnings(SimulationSummary, Evaluation, Job, UnitSystem)} and
 * {@link #notes(SimulationSummary, Job, UnitSystem)}: the same flags, figures in in, lbf, kpsi, lb and ft/s for US
 * customary units (exact factors, NIST SP 811, 2008 ed., Appendix B).
 */
public final class DynamicsFlags {
    /** Largest accepted difference between simulation and energy balance, %: 5 (coilwise's choice). */
    public static final double DEVIATION_LIMIT_PCT = 5;
    /**
     * A load lighter than this share of the active coil mass is "light": the balance's lumped allowance for the
     * spring's own mass assumes a load much heavier than the coils, so below 1 it cannot be trusted (coilwise's
     * choice; common practice treats spring mass as small against the load).
     */
    public static final double LIGHT_LOAD_RATIO = 1;

    private DynamicsFlags() {
    }

    /** One figure compared with the balance. */
    private record Comparison(String name, double simulated, double balance, double displayScale, String unit) {
        double relative() {
            if (Double.isNaN(simulated)) {
                return Double.NaN;
            }
            if (balance == 0) {
                return simulated == 0 ? 0 : Double.POSITIVE_INFINITY;
            }
            return Math.abs(simulated - balance) / Math.abs(balance);
        }
    }

    private static List<Comparison> comparisons(SimulationSummary s, Evaluation e, Job job, ShownUnits u) {
        if (job instanceof Arrest) {
            return List.of(new Comparison("maximum compression", s.maxCompression(), e.workingDeflection(),
                            u.length(1), u.lengthUnit()),
                    new Comparison("peak force", s.peakForce(), e.peakForce(), u.force(1), u.forceUnit()));
        }
        return List.of(new Comparison("exit speed", s.exitSpeed(), e.speed(), u.speed(1), u.speedUnit()),
                new Comparison("apex", s.apex(), e.predictedHeight(), u.length(1), u.lengthUnit()));
    }

    /**
     * Largest relative difference from the balance, %: maximum compression and peak force (arrest) or exit speed
     * and apex (launch). NaN when the simulated event did not end.
     */
    public static double deviationPct(SimulationSummary s, Evaluation e, Job job) {
        double worst = 0;
        for (Comparison c : comparisons(s, e, job, new ShownUnits(UnitSystem.SI))) {
            double r = c.relative();
            if (Double.isNaN(r)) {
                return Double.NaN;
            }
            worst = Math.max(worst, r);
        }
        return 100 * worst;
    }

    /** The summary with its deviation, warnings and notes filled in. */
    public static SimulationSummary complete(SimulationSummary s, Evaluation e, Job job) {
        SimulationSummary d = new SimulationSummary(s.masses(), s.maxCompression(), s.peakForce(), s.peakStress(),
                s.coilClash(), s.firstClashTime(), s.firstClashElement(), deviationPct(s, e, job), s.stopTime(),
                s.reboundSpeed(), s.exitSpeed(), s.apex(), List.of(), List.of());
        return d.withFlags(warnings(d, e, job), notes(d, job));
    }

    /** The warnings, each a sentence that says what happened, with figures in SI units. */
    public static List<String> warnings(SimulationSummary s, Evaluation e, Job job) {
        return warnings(s, e, job, UnitSystem.SI);
    }

    /** The warnings, each a sentence that says what happened, with figures in {@code units}. */
    public static List<String> warnings(SimulationSummary s, Evaluation e, Job job, UnitSystem units) {
        ShownUnits u = new ShownUnits(units);
        List<String> w = new ArrayList<>();
        boolean arrest = job instanceof Arrest;
        if (Double.isNaN(arrest ? s.reboundSpeed() : s.exitSpeed())) {
            w.add("the simulated event did not end within the simulated time; its figures are incomplete");
        }
        if (job instanceof Launch l && s.exitSpeed() == 0) {
            w.add(fmt(u.us() ? "the payload does not leave the guide: it comes to rest %.3f in below the muzzle"
                    : "the payload does not leave the guide: it comes to rest %.1f mm below the muzzle",
                    u.length(-s.apex() / Math.sin(l.angle()))));
        }
        if (s.peakStress() > e.allowableStress()) {
            w.add(fmt("simulated peak stress %.0f %s exceeds the allowable %.0f %s (the energy balance gives "
                            + "%.0f %s): the coils' own inertia raises the stress", u.stress(s.peakStress()),
                    u.stressUnit(), u.stress(e.allowableStress()), u.stressUnit(), u.stress(e.stressAtWorking()),
                    u.stressUnit()));
        }
        if (s.coilClash()) {
            w.add(fmt("coils clash: element %d of %d (counted from the fixed base) closes to its share of the solid "
                            + "length %.2f ms into the event", s.firstClashElement(), s.masses() + 1,
                    s.firstClashTime() * 1e3));
        }
        for (Comparison c : comparisons(s, e, job, u)) {
            double r = c.relative();
            if (r > DEVIATION_LIMIT_PCT / 100) {
                w.add(fmt("simulated %s %.4g %s differs from the energy balance (%.4g %s) by %.1f %%", c.name(),
                        c.simulated() * c.displayScale(), c.unit(), c.balance() * c.displayScale(), c.unit(),
                        100 * r));
            }
        }
        double ma = e.spring().activeMass();
        if (job.mass() < LIGHT_LOAD_RATIO * ma) {
            w.add(fmt("the %s (%.4g %s) is lighter than the spring's active coils (%.4g %s): the energy balance "
                    + "does not hold for so light a %s; rely on the simulated figures and on test",
                    arrest ? "load" : "payload", u.mass(job.mass()), u.massUnit(), u.mass(ma), u.massUnit(),
                    arrest ? "load" : "payload"));
        }
        return w;
    }

    /** Notes that are no fault of the design, with figures in SI units. */
    public static List<String> notes(SimulationSummary s, Job job) {
        return notes(s, job, UnitSystem.SI);
    }

    /** Notes that are no fault of the design, with figures in {@code units}. */
    public static List<String> notes(SimulationSummary s, Job job, UnitSystem units) {
        ShownUnits u = new ShownUnits(units);
        List<String> n = new ArrayList<>();
        if (job instanceof Arrest a) {
            if (s.reboundSpeed() > 0) {
                String share = a.contactSpeed() > 0
                        ? fmt(" (%.0f %% of the contact speed)", 100 * s.reboundSpeed() / a.contactSpeed()) : "";
                n.add(fmt("the load leaves the spring at %.3g %s%s: a spring returns what it stores; add damping "
                        + "or a catch if the rebound is unwanted", u.speed(s.reboundSpeed()), u.speedUnit(), share));
            } else if (s.reboundSpeed() == 0) {
                n.add("the load does not leave the spring: it turns back towards the base before it is clear of it");
            }
        }
        return n;
    }

    private static String fmt(String format, Object... args) {
        return String.format(Locale.ROOT, format, args);
    }
}
