package dev.coilwise.mechanics;

import dev.coilwise.materials.Material;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Envelope;
import dev.coilwise.model.Launch;
import dev.coilwise.model.Limits;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Seating;
import dev.coilwise.model.Spring;
import dev.coilwise.model.SpringOptions;

/**
 * Decides whether a spring of one wire (material and diameter) meets every hard limit of one requirement, without
 * building an {@link Evaluation}: no margin list, no records, no optionals. The search asks this first and evaluates
 * in full only the designs it passes. Immutable and thread-safe.
 *
 * <p>The answer is exactly {@code DesignEvaluator.evaluate(spring, requirement).feasible()}: the same formulas
 * (Shigley's MED 9th ed. relations named in {@link DesignEvaluator}, {@link ArrestBalance}, {@link LaunchBalance},
 * {@link Stress}, {@link SolidGrowth}, {@link Buckling}, {@link Surge}, {@link Fatigue}) written in the same order
 * of operations, so every figure is bit-identical, and the same rule for a holding margin
 * ({@link Margin#holds()}: (allowed − actual)/|allowed| ≥ −{@value #HOLDS_TOLERANCE}). The hard limits are checked
 * cheapest first and the first one that fails ends the check; fatigue, the only check that allocates, comes last.
 * A property test holds this class to the evaluator over random springs and requirements.
 */
public final class HardLimits {
    /** Margins within this fraction of zero hold: the tolerance of {@link Margin#holds()}. */
    public static final double HOLDS_TOLERANCE = 1e-9;

    private final Requirement req;
    private final Material material;
    private final double d;
    private final double gd4;
    private final double shearModulus;
    private final double youngsModulus;
    private final double area;
    private final double density;
    private final double allow;
    private final double surgeLimit;
    private final double xi;
    private final Arrest arrest;
    private final Launch launch;
    private final double push;
    private final double efficiency;
    private final double boreAllowed;
    private final double rodRequired;
    private final boolean buckleHard;
    private final boolean fatigueChecked;

    private HardLimits(Requirement req, Material material, double d) {
        this.req = req;
        this.material = material;
        this.d = d;
        SpringOptions opt = req.spring();
        Envelope env = req.envelope();
        this.shearModulus = material.shearModulus(d);
        this.youngsModulus = material.youngsModulus(d);
        this.gd4 = shearModulus * d * d * d * d;
        this.area = Math.PI * d * d / 4;
        this.density = material.density();
        this.allow = material.allowableStress(d, opt.setRemoved());
        this.surgeLimit = Surge.speedLimit(allow, density, shearModulus);
        this.xi = opt.clashAllowance();
        this.arrest = req.job() instanceof Arrest a ? a : null;
        this.launch = req.job() instanceof Launch l ? l : null;
        this.push = arrest == null ? 0 : arrest.pushForce();
        this.efficiency = launch == null ? 1 : launch.efficiency();
        this.boreAllowed = env.bore().isPresent()
                ? env.bore().getAsDouble() - env.clearance().of(env.bore().getAsDouble()) : Double.NaN;
        this.rodRequired = env.rod().isPresent()
                ? env.rod().getAsDouble() + env.clearance().of(env.rod().getAsDouble()) : Double.NaN;
        this.buckleHard = !env.guided();
        this.fatigueChecked = opt.cycles().isPresent() && opt.cycles().getAsDouble() >= Fatigue.STATIC_BELOW;
    }

    /**
     * The limits of {@code req} for wire {@code wireDiameter} (m) of {@code material}.
     *
     * @throws dev.coilwise.error.BadInputException when the material does not cover the diameter
     */
    public static HardLimits of(Requirement req, Material material, double wireDiameter) {
        return new HardLimits(req, material, wireDiameter);
    }

    /** Static allowable torsional stress of this wire, Pa. */
    public double allowableStress() {
        return allow;
    }

    /** Shear modulus G of this wire, Pa. */
    public double shearModulus() {
        return shearModulus;
    }

    /** Young's modulus E of this wire, Pa. */
    public double youngsModulus() {
        return youngsModulus;
    }

    /** Whether {@code s} meets every hard limit; {@code s} must be of this material and wire diameter. */
    public boolean feasible(Spring s) {
        if (s.material() != material || s.wireDiameter() != d) {
            throw new IllegalArgumentException("spring of " + s.material() + " d=" + s.wireDiameter()
                    + " m checked against limits for " + material + " d=" + d + " m");
        }
        return feasible(s.ends(), s.meanDiameter(), s.activeCoils(), s.freeLength());
    }

    /**
     * Whether the spring (this wire; {@code ends}, mean diameter {@code dm} m, {@code na} active coils, free length
     * {@code l0} m) meets every hard limit. The geometry must be a valid {@link Spring}.
     */
    public boolean feasible(EndType ends, double dm, double na, double l0) {
        SpringOptions opt = req.spring();
        Limits lim = req.limits();
        Envelope env = req.envelope();
        double k = gd4 / (8 * dm * dm * dm * na);
        double preloadDefl = 0;
        double work;
        double peak;
        double speed;
        if (arrest != null) {
            if (env.pocketLength().isPresent()) {
                double pocket = env.pocketLength().getAsDouble();
                if (!atLeast(l0, pocket)) {
                    return false;
                }
                preloadDefl = Math.max(0, l0 - pocket);
            }
            double f0 = k * preloadDefl;
            work = ArrestBalance.maxCompression(k, arrest.mass(), arrest.contactSpeed(), push, f0);
            peak = ArrestBalance.peakForce(k, f0, work);
            speed = arrest.contactSpeed();
            if (lim.deceleration().isPresent() && !atMost(ArrestBalance.peakDeceleration(peak, push, arrest.mass()),
                    lim.deceleration().getAsDouble())) {
                return false;
            }
        } else {
            double activeMass = na * Math.PI * dm * area * density;
            work = LaunchBalance.cockedCompression(k, launch.height(), launch.mass(), activeMass, launch.angle(),
                    efficiency);
            peak = k * work;
            speed = LaunchBalance.exitSpeed(k, work, launch.mass(), activeMass, launch.angle(), efficiency);
        }
        if (!atMost(work, lim.stroke()) || !atMost(speed, surgeLimit)
                || lim.peakForce().isPresent() && !atMost(peak, lim.peakForce().getAsDouble())) {
            return false;
        }
        double ls = ends.solidLength(d, ends.totalCoils(na));
        double total = preloadDefl + work;
        if (!atMost(total, (l0 - ls) / (1 + xi)) || !atMost(Stress.corrected(peak, dm, d), allow)
                || opt.solidSafe() && !atMost(Stress.corrected(k * (l0 - ls), dm, d), allow)) {
            return false;
        }
        double c = dm / d;
        if (!holds(Math.min((c - opt.indexMin()) / opt.indexMin(), (opt.indexMax() - c) / opt.indexMax()))
                || !holds(Math.min((na - opt.coilsMin()) / opt.coilsMin(), (opt.coilsMax() - na) / opt.coilsMax()))) {
            return false;
        }
        if (env.maxFreeLength().isPresent() && !atMost(l0, env.maxFreeLength().getAsDouble())
                || env.rod().isPresent() && !atLeast(dm - d, rodRequired)
                || env.bore().isPresent() && !atMost(outerDiameterAtSolid(ends, dm, na, l0, ls), boreAllowed)) {
            return false;
        }
        if (buckleHard && !bucklingHolds(dm, l0, total, opt.seating())) {
            return false;
        }
        return !fatigueChecked || fatigueHolds(ends, dm, na, l0, k * preloadDefl, peak);
    }

    /** {@link SolidGrowth#outerDiameterAtSolid} with the pitch of {@link Spring#pitch()}, m. */
    private double outerDiameterAtSolid(EndType ends, double dm, double na, double l0, double ls) {
        double p = ends == EndType.PLAIN_GROUND ? l0 / ends.totalCoils(na) : (l0 - (ls - na * d)) / na;
        return Math.sqrt(dm * dm + Math.max(0, p * p - d * d) / (Math.PI * Math.PI)) + d;
    }

    /** The buckling margin of {@link DesignEvaluator}: +∞ (holds) when {@link Buckling} finds the spring stable. */
    private boolean bucklingHolds(double dm, double l0, double total, Seating seating) {
        if (material.steel() && l0 < Buckling.absoluteStabilityLength(dm, seating)) {
            return true;
        }
        double ycr = Buckling.criticalDeflection(l0, dm, youngsModulus, shearModulus, seating.alpha());
        return ycr == Double.POSITIVE_INFINITY || atMost(total, ycr);
    }

    private boolean fatigueHolds(EndType ends, double dm, double na, double l0, double minForce, double peak) {
        SpringOptions opt = req.spring();
        Spring s = new Spring(material, ends, d, dm, na, l0);
        FatigueCheck f = Fatigue.check(s, minForce, peak, opt.cycles().getAsDouble(), opt.shotPeened(), allow);
        return atLeast(f.safetyFactor(), opt.fatigueMargin());
    }

    /** {@code Margin.atMost(key, actual, allowed, unit, true).holds()}, without the record. */
    public static boolean atMost(double actual, double allowed) {
        return holds((allowed - actual) / Math.abs(allowed));
    }

    /** {@code Margin.atLeast(key, actual, required, unit, true).holds()}, without the record. */
    public static boolean atLeast(double actual, double required) {
        return holds((actual - required) / Math.abs(required));
    }

    private static boolean holds(double marginValue) {
        return marginValue >= -HOLDS_TOLERANCE;
    }
}
