package dev.coilwise.scatter;

import dev.coilwise.error.BadInputException;
import dev.coilwise.error.Check;
import dev.coilwise.error.InternalFaultException;
import dev.coilwise.materials.Material;
import dev.coilwise.mechanics.Buckling;
import dev.coilwise.mechanics.CyclicStressTable;
import dev.coilwise.mechanics.DesignEvaluator;
import dev.coilwise.mechanics.Fatigue;
import dev.coilwise.mechanics.FatigueCriterion;
import dev.coilwise.mechanics.FatigueStrength;
import dev.coilwise.mechanics.HardLimits;
import dev.coilwise.mechanics.Stress;
import dev.coilwise.mechanics.Surge;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Envelope;
import dev.coilwise.model.Limits;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Seating;
import dev.coilwise.model.Spring;
import dev.coilwise.model.SpringOptions;

/**
 * The hard limits on a made spring of one design, checked from plain numbers: every hard margin of
 * {@link DesignEvaluator#evaluate} except the design rules of {@link Installation#DESIGN_RULES} and the two that only
 * an arrest has (deceleration and pocket, which {@link SampleEvaluator} checks itself). Immutable and thread-safe.
 *
 * <p>The wire of every made spring is the nominal wire ({@link SpringMaker}): its tensile strength, static allowable
 * stress, Young's modulus, density and fatigue data are fixed here; only the shear modulus G comes with each spring.
 * Every figure is computed with the evaluator's formulas in its order of operations (or by the same static methods
 * of {@code dev.coilwise.mechanics}), and a margin holds by {@link HardLimits#atMost}/{@link HardLimits#atLeast}, the
 * rule of {@code Margin.holds()}; so the verdict is exactly that of the evaluation (held to it by
 * {@code SampleEvaluatorTest}). Every check that can throw is always run, so a sample that the evaluator rejects with a
 * {@link dev.coilwise.error.CoilwiseException} throws here too.
 */
final class PartLimits {
    /** The criteria in declaration order, read once ({@code values()} copies its array on every call). */
    private static final FatigueCriterion[] CRITERIA = FatigueCriterion.values();

    private final double stroke;
    private final double peakForce;
    private final double xi;
    private final boolean solidSafe;
    private final double allow;
    private final double boreAllowed;
    private final double rodRequired;
    private final double maxFreeLength;
    private final boolean buckleHard;
    private final Seating seating;
    private final boolean steel;
    private final double youngsModulus;
    private final double density;
    private final double surgeLimitNominal;
    private final double nominalShearModulus;
    private final boolean fatigueChecked;
    private final double cycles;
    private final double fatigueMargin;
    private final double sut;
    private final FatigueStrength zimmerli;
    private final FatigueStrength cyclicTable;

    /**
     * @param req     the requirement
     * @param nominal the nominal design; its material is the made springs' wire
     * @param wire    the made springs' pinned wire material ({@link SpringMaker#pinned()})
     */
    PartLimits(Requirement req, Spring nominal, Material wire) {
        SpringOptions opt = req.spring();
        Limits lim = req.limits();
        Envelope env = req.envelope();
        double d = nominal.wireDiameter();
        this.stroke = lim.stroke();
        this.peakForce = lim.peakForce().orElse(Double.NaN);
        this.xi = opt.clashAllowance();
        this.solidSafe = opt.solidSafe();
        this.allow = wire.allowableStress(d, opt.setRemoved());
        this.boreAllowed = env.bore().isPresent()
                ? env.bore().getAsDouble() - env.clearance().of(env.bore().getAsDouble()) : Double.NaN;
        this.rodRequired = env.rod().isPresent()
                ? env.rod().getAsDouble() + env.clearance().of(env.rod().getAsDouble()) : Double.NaN;
        this.maxFreeLength = env.maxFreeLength().orElse(Double.NaN);
        this.buckleHard = !env.guided();
        this.seating = opt.seating();
        this.steel = wire.steel();
        this.youngsModulus = wire.youngsModulus(d);
        this.density = wire.density();
        this.nominalShearModulus = wire.shearModulus(d);
        this.surgeLimitNominal = Surge.speedLimit(allow, density, nominalShearModulus);
        this.fatigueChecked = opt.cycles().isPresent() && opt.cycles().getAsDouble() >= Fatigue.STATIC_BELOW;
        this.cycles = opt.cycles().orElse(Double.NaN);
        this.fatigueMargin = opt.fatigueMargin();
        this.sut = wire.tensileStrength(d);
        this.zimmerli = FatigueStrength.zimmerli(opt.shotPeened());
        this.cyclicTable = fatigueChecked && steel ? FatigueStrength.repeated(
                CyclicStressTable.forMaterial(wire).fraction(cycles, opt.shotPeened()) * sut, "cyclic_table") : null;
    }

    /** Static allowable torsional stress of the wire, Pa. */
    double allowableStress() {
        return allow;
    }

    /**
     * Whether every limit holds for the made spring at its working point.
     *
     * @param ends    end type
     * @param d       wire diameter, m
     * @param dm      mean diameter, m
     * @param na      active coils
     * @param l0      free length, m
     * @param ls      solid length, m
     * @param g       shear modulus, Pa
     * @param k       rate, N/m
     * @param preload preload deflection, m
     * @param work    working deflection, m
     * @param peak    peak (arrest) or cocking (launch) force, N
     * @param tauWork corrected stress at {@code peak}, Pa
     * @param speed   contact (arrest) or exit (launch) speed, m/s
     * @throws dev.coilwise.error.CoilwiseException where the evaluator would throw
     */
    boolean hold(EndType ends, double d, double dm, double na, double l0, double ls, double g, double k, double preload,
                 double work, double peak, double tauWork, double speed) {
        boolean ok = HardLimits.atMost(work, stroke);
        if (!Double.isNaN(peakForce)) {
            ok &= HardLimits.atMost(peak, peakForce);
        }
        double total = preload + work;
        ok &= HardLimits.atMost(total, (l0 - ls) / (1 + xi));
        double tauSolid = Stress.corrected(k * (l0 - ls), dm, d);
        ok &= HardLimits.atMost(tauWork, allow);
        if (solidSafe) {
            ok &= HardLimits.atMost(tauSolid, allow);
        }
        if (!Double.isNaN(boreAllowed)) {
            // SolidGrowth.outerDiameterAtSolid with the pitch of Spring.pitch().
            double p = ends == EndType.PLAIN_GROUND ? l0 / ends.totalCoils(na) : (l0 - (ls - na * d)) / na;
            double od = Math.sqrt(dm * dm + Math.max(0, p * p - d * d) / (Math.PI * Math.PI)) + d;
            ok &= HardLimits.atMost(od, boreAllowed);
        }
        if (!Double.isNaN(rodRequired)) {
            ok &= HardLimits.atLeast(dm - d, rodRequired);
        }
        if (!Double.isNaN(maxFreeLength)) {
            ok &= HardLimits.atMost(l0, maxFreeLength);
        }
        if (buckleHard && !(steel && l0 < Buckling.absoluteStabilityLength(dm, seating))) {
            double ycr = Buckling.criticalDeflection(l0, dm, youngsModulus, g, seating.alpha());
            ok &= ycr == Double.POSITIVE_INFINITY || HardLimits.atMost(total, ycr);
        }
        double surgeLimit = g == nominalShearModulus ? surgeLimitNominal : Surge.speedLimit(allow, density, g);
        ok &= HardLimits.atMost(speed, surgeLimit);
        if (fatigueChecked) {
            ok &= HardLimits.atLeast(fatigueSafety(d, dm, k * preload, peak), fatigueMargin);
        }
        return ok;
    }

    /**
     * The fatigue safety factor of {@code Fatigue.check} (cycles ≥ 10⁴, so never the static case) without its
     * records: the same checks, the same strength points and the smallest factor over them.
     */
    private double fatigueSafety(double d, double dm, double minForce, double maxForce) {
        Check.nonNegative("smallest working force", minForce, "N");
        if (maxForce < minForce) {
            throw new BadInputException("largest working force below the smallest working force");
        }
        double tauMin = Stress.corrected(minForce, dm, d);
        double tauMax = Stress.corrected(maxForce, dm, d);
        Check.nonNegative("smallest working stress", tauMin, "Pa");
        Check.nonNegative("largest working stress", tauMax, "Pa");
        double tauA = (tauMax - tauMin) / 2;
        double tauM = (tauMax + tauMin) / 2;
        double best;
        if (!steel) {
            Check.nonNegative("stress amplitude", tauA, "Pa");
            best = 0;
        } else if (tauA <= 0) {
            best = Double.POSITIVE_INFINITY;
        } else {
            best = Double.POSITIVE_INFINITY;
            if (cycles >= Fatigue.INFINITE_FROM && d <= FatigueStrength.ZIMMERLI_MAX_WIRE * (1 + 1e-9)) {
                best = smallest(zimmerli, tauA, tauM, best);
            }
            best = smallest(cyclicTable, tauA, tauM, best);
        }
        if (Double.isNaN(best) || best < 0) {
            throw new InternalFaultException("fatigue safety factor must be ≥ 0, got " + best);
        }
        return best;
    }

    private double smallest(FatigueStrength point, double tauA, double tauM, double best) {
        for (FatigueCriterion c : CRITERIA) {
            double n = c.safetyFactor(point, sut, Fatigue.LOAD_LINE, tauA, tauM);
            if (n < best) {
                best = n;
            }
        }
        return best;
    }
}
