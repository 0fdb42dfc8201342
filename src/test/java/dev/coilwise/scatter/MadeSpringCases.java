package dev.coilwise.scatter;

import dev.coilwise.materials.Material;
import dev.coilwise.materials.MaterialTable;
import dev.coilwise.mechanics.Buckling;
import dev.coilwise.mechanics.DesignEvaluator;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.mechanics.LaunchBalance;
import dev.coilwise.mechanics.Stress;
import dev.coilwise.mechanics.Surge;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.Clearance;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Envelope;
import dev.coilwise.model.Job;
import dev.coilwise.model.Launch;
import dev.coilwise.model.Limits;
import dev.coilwise.model.Ranking;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Seating;
import dev.coilwise.model.Spring;
import dev.coilwise.model.SpringOptions;
import dev.coilwise.model.UnitSystem;
import dev.coilwise.tolerance.En15800;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Random;

/**
 * Generated made-spring cases for holding the Monte Carlo's per-sample path to the reference path: a nominal design
 * (any material, wire, end type, index and coil count), its tolerances (EN 15800, widened, none, or so wide that
 * some made springs cannot exist, with or without a modulus scatter), one set of normalised deviations, and a
 * requirement of either job (pocket, bore, rod, free length, force and deceleration limits, cycle counts).
 *
 * <p>The limits are placed from the figures of that very made spring (or, now and then, of the nominal one) in one
 * of three ways ({@link Edges}): at random; every limit on its edge or a little generous; or one limit, the focus, on
 * its edge and the others out of the way, so that it alone decides the verdict. "On the edge" is within 2 parts per
 * billion of the figure, across the tolerance of a holding margin (10⁻⁹), where a difference in rounding between the
 * two paths would change the verdict. Invented scenarios, not check values.
 */
final class MadeSpringCases {
    static final MaterialTable TABLE = MaterialTable.loadDefault();

    /** A design, its tolerances, a requirement, the settings and one made spring's deviations (d, D, L0, Na, G). */
    record Case(Spring nominal, HalfWidths halfWidths, Requirement requirement, ScatterSettings settings, double[] z) {
        @Override
        public String toString() {
            return nominal + " ± " + halfWidths + " z=" + Arrays.toString(z) + " settings " + settings + " against "
                    + requirement;
        }
    }

    private MadeSpringCases() {
    }

    static Case random(Random r) {
        Edges edges = new Edges(r);
        Seating seating = Seating.values()[r.nextInt(Seating.values().length)];
        Spring nominal = design(r);
        boolean setRemoved = !edges.is("stress_working") && !edges.is("stress_solid") && r.nextBoolean();
        double allow = nominal.material().allowableStress(nominal.wireDiameter(), setRemoved);
        if (edges.is("stress_solid")) { // the stress at solid on the allowable
            nominal = nominal.withFreeLength(nominal.solidLength() + Stress.forceFor(allow, nominal.meanDiameter(),
                    nominal.wireDiameter()) / nominal.rate() * edges.upper("stress_solid"));
        }
        HalfWidths h = halfWidths(r, nominal);
        // Limits on the design's own stresses and buckling can only be put on the edge of the nominal spring, so the
        // made spring is then made exactly (no deviation).
        double[] z = edges.is("stress_working") || edges.is("stress_solid") || edges.is("buckling")
                ? new double[DeviationSampler.DRAWS] : deviations(r);
        SpringMaker maker = new SpringMaker(nominal, h);
        Spring made;
        try {
            made = maker.make(z);
        } catch (RuntimeException e) {
            made = null;
        }
        boolean arrest = edges.arrestOnly() || !edges.is("band") && r.nextBoolean();
        Job job = arrest ? arrest(r, nominal, made, allow, seating, edges) : launch(r, nominal);
        double xi = r.nextInt(4) == 0 ? 0 : 0.3 * r.nextDouble();
        OptionalDouble cycles = edges.mode == Edges.ONE && !edges.is("fatigue") ? OptionalDouble.empty()
                : edges.is("fatigue") || r.nextInt(3) == 0 ? OptionalDouble.of(Math.pow(10, 4 + 4 * r.nextDouble()))
                : OptionalDouble.empty();
        boolean solidSafe = edges.mode == Edges.ONE ? edges.is("stress_solid") : r.nextInt(4) != 0;
        SpringOptions base = options(xi, solidSafe, setRemoved, seating, cycles, r.nextBoolean(), 1.0);
        Limits open = new Limits(10, OptionalDouble.empty(), OptionalDouble.empty());
        ScatterSettings settings = edges.mode == Edges.ONE && !edges.is("band")
                ? new ScatterSettings(100, r.nextLong(), 0.9, Double.POSITIVE_INFINITY)
                : new ScatterSettings(100, r.nextLong(), 0.3 * r.nextDouble(),
                        r.nextInt(5) == 0 ? Double.POSITIVE_INFINITY : 0.3 * r.nextDouble());
        Spring anchor = made != null && r.nextInt(4) != 0 ? made : nominal;
        OptionalDouble pocket = arrest && (edges.is("pocket") || edges.mode != Edges.ONE && r.nextBoolean())
                ? OptionalDouble.of(anchor.freeLength() * edges.lower("pocket")) : OptionalDouble.empty();
        Envelope pocketOnly = new Envelope(OptionalDouble.empty(), OptionalDouble.empty(), Clearance.DEFAULT,
                OptionalDouble.empty(), pocket);
        Requirement loose = requirement(job, open, pocketOnly, base);
        if (job instanceof Launch target) {
            double[] figures = new double[6];
            int outcome = MonteCarlo.byRecords(Installation.of(nominal, loose, settings), maker, z, figures);
            double apex = figures[1];
            double t = target.height();
            if (outcome != SampleEvaluator.INVALID && edges.onEdge("band")) { // an end of the band at this apex
                settings = apex < t
                        ? new ScatterSettings(100, settings.seed(),
                                Math.max(0, Math.min(1, 1 - apex / t * edges.lower("band"))), settings.heightOvershoot())
                        : new ScatterSettings(100, settings.seed(), settings.heightShortfall(),
                                Math.max(0, apex / t * edges.upper("band") - 1));
            }
            if (anchor == made) { // the launch the reference path evaluates this made spring for: height = its rise
                double cocked = DesignEvaluator.evaluate(nominal, loose).workingDeflection();
                try {
                    double rise = LaunchBalance.height(made.rate(), cocked + maker.freeLengthDeviation(z),
                            target.mass(), made.activeMass(), target.angle(), target.efficiency());
                    if (rise > 0 && Double.isFinite(rise)) {
                        loose = requirement(new Launch(target.mass(), rise, target.angle(), target.losses()), open,
                                pocketOnly, base);
                    }
                } catch (RuntimeException ex) {
                    anchor = nominal;
                }
            }
        }
        Evaluation e;
        try {
            e = DesignEvaluator.evaluate(anchor, loose);
        } catch (RuntimeException ex) {
            e = DesignEvaluator.evaluate(nominal, requirement(job, open, pocketOnly, base));
            anchor = nominal;
        }
        Envelope env = envelope(r, edges, e, anchor, pocket);
        double edgeXi = anchor.deflectionToSolid() / (e.totalDeflection() * edges.upper("coil_bind")) - 1;
        double margin = e.fatigue().isPresent()
                ? Math.max(0.5, Math.min(5, e.fatigue().get().safetyFactor() * edges.lower("fatigue"))) : 1.0;
        SpringOptions opt = options(edges.mode != Edges.RANDOM && edgeXi >= 0 ? Math.min(2, edgeXi) : xi, solidSafe,
                setRemoved, seating, cycles, base.shotPeened(), margin);
        double stroke = e.workingDeflection() * edges.upper("stroke");
        OptionalDouble force = edges.maybe("peak_force", e.peakForce() * edges.upper("peak_force"));
        OptionalDouble decel = arrest && e.peakDeceleration() > 0
                ? edges.maybe("deceleration", e.peakDeceleration() * edges.upper("deceleration"))
                : OptionalDouble.empty();
        Limits lim = new Limits(stroke > 0 ? stroke : 1e-3, force, decel);
        return new Case(nominal, h, requirement(job, lim, env, opt), settings, z);
    }

    /** Bore, rod and free length from the anchor's figures; a spring with no focus on buckling is often guided. */
    private static Envelope envelope(Random r, Edges edges, Evaluation e, Spring anchor, OptionalDouble pocket) {
        Clearance cl = r.nextBoolean() ? Clearance.DEFAULT : Clearance.ofLength(1e-3 * r.nextDouble());
        double shareLeft = Double.isNaN(cl.length()) ? 1 - cl.fraction() : 1;
        double gap = Double.isNaN(cl.length()) ? 0 : cl.length();
        boolean guided = edges.mode == Edges.ONE ? !edges.is("buckling") : r.nextBoolean();
        boolean unguided = edges.is("buckling");
        int guide = r.nextInt(3); // guided by a bore, a rod or both
        double boreSize = (e.outerDiameterAtSolid() * edges.upper("bore") + gap) / shareLeft;
        OptionalDouble bore = unguided ? OptionalDouble.empty() : guided && guide != 1 || edges.is("bore")
                ? OptionalDouble.of(boreSize) : guided ? OptionalDouble.empty() : maybe(r, boreSize);
        double rodShare = Double.isNaN(cl.length()) ? 1 + cl.fraction() : 1;
        double rodSize = (anchor.innerDiameter() * edges.lower("rod") - gap) / rodShare;
        OptionalDouble rod = unguided || rodSize <= 0 ? OptionalDouble.empty() : guided && guide != 0 || edges.is("rod")
                ? OptionalDouble.of(rodSize) : guided ? OptionalDouble.empty() : maybe(r, rodSize);
        if (rod.isPresent() && bore.isPresent() && rod.getAsDouble() >= bore.getAsDouble()) {
            rod = OptionalDouble.empty();
        }
        OptionalDouble maxL0 = edges.maybe("free_length", anchor.freeLength() * edges.upper("free_length"));
        if (pocket.isPresent() && maxL0.isPresent() && pocket.getAsDouble() > maxL0.getAsDouble()) {
            maxL0 = OptionalDouble.empty();
        }
        return new Envelope(bore, rod, cl, maxL0, pocket);
    }

    /** Any material and end type, index 3..16, 1..26 coils, a stress at solid of 50..105 % of the allowable. */
    private static Spring design(Random r) {
        List<Material> mats = TABLE.all();
        Material m = mats.get(r.nextInt(mats.size()));
        double d = m.minDiameter() * Math.pow(m.maxDiameter() / m.minDiameter(), r.nextDouble());
        EndType ends = EndType.values()[r.nextInt(EndType.values().length)];
        double dm = d * (3 + 13 * r.nextDouble());
        double na = 1 + Math.floor(r.nextDouble() * 100) / 4;
        double ls = ends.solidLength(d, ends.totalCoils(na));
        Spring probe = new Spring(m, ends, d, dm, na, ls * 2);
        double toSolid = Stress.forceFor(m.allowableStress(d, false), dm, d) / probe.rate()
                * (0.5 + 0.55 * r.nextDouble());
        return probe.withFreeLength(Math.max(ls * 1.01, ls + toSolid));
    }

    /**
     * A load whose energy the nominal spring takes in 30..90 % of its room to solid (over 1.15); with a focus on the
     * working stress, buckling or surge, a straight push-free load that puts that limit on its edge.
     */
    private static Job arrest(Random r, Spring s, Spring made, double allow, Seating seating, Edges edges) {
        double k = s.rate();
        double room = s.deflectionToSolid() / 1.15;
        double mass = Math.exp(r.nextDouble() * 8 - 4);
        double x = Double.NaN;
        if (edges.is("stress_working")) {
            x = Stress.forceFor(allow, s.meanDiameter(), s.wireDiameter()) * edges.upper("stress_working") / k;
        } else if (edges.is("buckling")) {
            x = Buckling.criticalDeflection(s, seating) * edges.upper("buckling");
        } else if (edges.is("surge") && made != null) {
            double v = Surge.speedLimit(allow, made.material().density(), made.shearModulus()) * edges.upper("surge");
            double xm = made.deflectionToSolid() / 1.15 * (0.3 + 0.6 * r.nextDouble());
            return new Arrest(made.rate() * xm * xm / (v * v), v, 0, 0, Double.NaN);
        }
        if (Double.isFinite(x) && x > 0) {
            return new Arrest(mass, Math.sqrt(k * x * x / mass), 0, 0, Double.NaN);
        }
        x = room * (0.3 + 0.6 * r.nextDouble());
        Arrest a = new Arrest(mass, 0, Math.PI * (r.nextDouble() - 0.5), r.nextInt(3) == 0 ? 40 * r.nextDouble() : 0,
                Double.NaN);
        double energy = 0.5 * k * x * x - a.pushForce() * x;
        return new Arrest(mass, energy > 0 ? Math.sqrt(2 * energy / mass) : 0, a.angle(), a.driveForce(), Double.NaN);
    }

    /** A payload the nominal spring throws from 30..90 % of its room to solid (over 1.15). */
    private static Job launch(Random r, Spring s) {
        double k = s.rate();
        double x = s.deflectionToSolid() / 1.15 * (0.3 + 0.6 * r.nextDouble());
        double angle = Math.toRadians(15 + 75 * r.nextDouble());
        double eta = r.nextInt(2) == 0 ? 1 : 1 - 0.3 * r.nextDouble();
        double ma = s.activeMass();
        double lift = 9.80665 * Math.sin(angle);
        double mass = Math.max(1e-3, eta * k * x * (0.05 + 0.45 * r.nextDouble()) / (2 * lift));
        double v2 = (eta * k * x * x - 2 * (mass + ma / 2) * lift * x) / (mass + ma / 3);
        double height = v2 > 0 ? v2 * Math.sin(angle) * Math.sin(angle) / (2 * 9.80665) : 0.01;
        return new Launch(mass, height, angle, 1 - eta);
    }

    /** EN 15800 at a random grade, widened up to 30 times, none, or wide enough to make impossible springs. */
    static HalfWidths halfWidths(Random r, Spring s) {
        double g = r.nextInt(3) == 0 ? 0 : 0.5 * r.nextDouble() * r.nextDouble();
        switch (r.nextInt(4)) {
            case 0:
                return new HalfWidths(0, 0, 0, 0, g);
            case 1:
                return new HalfWidths(s.wireDiameter() * 0.9 * r.nextDouble(), s.meanDiameter() * 0.6 * r.nextDouble(),
                        s.freeLength() * 0.6 * r.nextDouble(), s.activeCoils() * 0.6 * r.nextDouble(), g);
            default:
                double w = r.nextBoolean() ? 1 : 1 + 29 * r.nextDouble();
                try {
                    var t = En15800.of(s, 1 + r.nextInt(3));
                    return new HalfWidths(t.wireDiameter() * w, t.meanDiameter() * w, t.freeLength() * w,
                            t.activeCoils() * w, g);
                } catch (RuntimeException e) { // a spring outside the standard: a plain 1 % on each dimension
                    return new HalfWidths(s.wireDiameter() * 0.01 * w, s.meanDiameter() * 0.01 * w,
                            s.freeLength() * 0.01 * w, 0.25 * w, g);
                }
        }
    }

    /** Five normalised deviations in [−3, 3], now and then exactly 0 or ±3. */
    private static double[] deviations(Random r) {
        double[] z = new double[DeviationSampler.DRAWS];
        for (int i = 0; i < z.length; i++) {
            int kind = r.nextInt(10);
            z[i] = kind == 0 ? 0 : kind == 1 ? (r.nextBoolean() ? 3 : -3) : Math.max(-3, Math.min(3, r.nextGaussian()));
        }
        return z;
    }

    private static OptionalDouble maybe(Random r, double v) {
        return r.nextInt(3) == 0 && v > 0 && Double.isFinite(v) ? OptionalDouble.of(v) : OptionalDouble.empty();
    }

    private static SpringOptions options(double xi, boolean solidSafe, boolean setRemoved, Seating seating,
                                         OptionalDouble cycles, boolean peened, double fatigueMargin) {
        return new SpringOptions(List.of(), List.of(EndType.CLOSED_GROUND), 2, 30, 1, 200, xi, solidSafe, setRemoved,
                seating, Optional.empty(), cycles, peened, fatigueMargin, 2);
    }

    static Requirement requirement(Job job, Limits lim, Envelope env, SpringOptions opt) {
        return new Requirement("generated", job, lim, env, opt, Ranking.defaults(), UnitSystem.SI, List.of());
    }

    /**
     * Where a case puts its limits relative to the anchor spring's figures, in one of three modes: at random (0.8 to
     * 1.6 times the figure for an upper limit, 0.6 to 1.2 for a lower one: a quarter to a third of them fail); every
     * limit on its edge or a little generous, half and half; or one limit, the focus, on its edge and every other one
     * generous or absent, so that it alone decides the verdict.
     */
    private static final class Edges {
        static final int RANDOM = 0;
        static final int ALL = 1;
        static final int ONE = 2;
        private static final String[] KEYS = {"stroke", "peak_force", "deceleration", "pocket", "bore", "rod",
                "free_length", "coil_bind", "fatigue", "band", "stress_working", "stress_solid", "buckling", "surge"};
        private static final List<String> ARREST_ONLY = List.of("deceleration", "pocket", "stress_working", "buckling",
                "surge");

        final int mode;
        private final String focus;
        private final Random r;

        Edges(Random r) {
            this.r = r;
            this.mode = r.nextInt(3);
            this.focus = mode == ONE ? KEYS[r.nextInt(KEYS.length)] : "";
        }

        boolean is(String key) {
            return key.equals(focus);
        }

        boolean arrestOnly() {
            return ARREST_ONLY.contains(focus);
        }

        boolean onEdge(String key) {
            return mode == ALL || is(key);
        }

        double upper(String key) {
            return is(key) ? edge() : mode == ALL ? (r.nextBoolean() ? edge() : 1.02 + 0.48 * r.nextDouble())
                    : mode == ONE ? 1.02 + 0.48 * r.nextDouble() : 0.8 + 0.8 * r.nextDouble();
        }

        double lower(String key) {
            return is(key) ? edge() : mode == ALL ? (r.nextBoolean() ? edge() : 0.98 - 0.28 * r.nextDouble())
                    : mode == ONE ? 0.98 - 0.28 * r.nextDouble() : 0.6 + 0.6 * r.nextDouble();
        }

        /** An optional limit: always there when it is the focus, otherwise one time in three. */
        OptionalDouble maybe(String key, double v) {
            return is(key) && v > 0 && Double.isFinite(v) ? OptionalDouble.of(v) : MadeSpringCases.maybe(r, v);
        }

        private double edge() {
            return 1 + (r.nextInt(5) - 2) * 1e-9;
        }
    }
}
