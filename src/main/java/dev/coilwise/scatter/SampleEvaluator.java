package dev.coilwise.scatter;

import dev.coilwise.error.CoilwiseException;
import dev.coilwise.materials.Material;
import dev.coilwise.materials.StrengthBand;
import dev.coilwise.mechanics.ArrestBalance;
import dev.coilwise.mechanics.DesignEvaluator;
import dev.coilwise.mechanics.HardLimits;
import dev.coilwise.mechanics.LaunchBalance;
import dev.coilwise.mechanics.Stress;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Launch;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import java.util.Arrays;
import java.util.List;

/**
 * The Monte Carlo's per-sample path: works one made spring of a design straight from its normalised deviations and
 * writes its figures and verdict, building no {@link Spring}, {@link Material}, evaluation or margin. Immutable and
 * thread-safe: one instance serves every sample of a design.
 *
 * <p>It gives exactly what {@link SpringMaker#make} followed by {@link Installation#run} gives (the reference path,
 * which builds the made spring and runs {@link DesignEvaluator#evaluate} on it): the same made geometry
 * (d, D, Na, L0 and G, in the same order of operations), the same test of whether such a spring can exist (the checks
 * of the {@code Spring} record and of the pinned wire's diameter range), the same figures, bit for bit, and the same
 * verdict ({@link PartLimits}). {@code SampleEvaluatorTest} holds the two paths to each other.
 */
abstract class SampleEvaluator {
    /** The made spring meets the requirement. */
    static final int MEETS = 0;
    /** The made spring exists but fails a limit (or, for a launch, the apex band). */
    static final int FAILS = 1;
    /** The deviations give no valid spring (figures NaN): what the reference path reports with an exception. */
    static final int INVALID = 2;

    private final EndType ends;
    private final double d0;
    private final double dm0;
    private final double na0;
    private final double l00;
    private final double g0;
    private final HalfWidths h;
    private final StrengthBand wire;
    final PartLimits limits;

    SampleEvaluator(Spring nominal, HalfWidths halfWidths, Requirement req) {
        SpringMaker maker = new SpringMaker(nominal, halfWidths);
        Material pinned = maker.pinned();
        this.ends = nominal.ends();
        this.d0 = nominal.wireDiameter();
        this.dm0 = nominal.meanDiameter();
        this.na0 = nominal.activeCoils();
        this.l00 = nominal.freeLength();
        this.g0 = pinned.shearModulus(d0);
        this.h = halfWidths;
        this.wire = pinned.strength().get(0);
        this.limits = new PartLimits(req, nominal, pinned);
    }

    /** The evaluator for this design's job, in the machine built for the nominal design ({@link Installation#of}). */
    static SampleEvaluator of(Spring nominal, HalfWidths halfWidths, Requirement req, ScatterSettings settings) {
        if (req.job() instanceof Launch launch) {
            double cocked = DesignEvaluator.evaluate(nominal, req).workingDeflection();
            return new Launcher(nominal, halfWidths, req, launch, cocked, settings);
        }
        return new Buffer(nominal, halfWidths, req, (Arrest) req.job());
    }

    /** The figures {@link #run} writes, in order: those of {@link Installation#figures()}. */
    abstract List<Figure> figures();

    /**
     * Works the made spring of normalised deviations {@code z} (d, D, L0, Na, G) and writes its figures (SI, in
     * {@link #figures()} order) into {@code out}: NaN for a spring that cannot exist or whose evaluation throws
     * (as {@link MonteCarlo#byRecords} reports it).
     *
     * @return {@link #MEETS}, {@link #FAILS} or {@link #INVALID}
     */
    final int outcome(double[] z, double[] out) {
        int outcome;
        try {
            outcome = run(z, out);
        } catch (CoilwiseException e) {
            outcome = INVALID;
        }
        if (outcome == INVALID) {
            Arrays.fill(out, Double.NaN);
        }
        return outcome;
    }

    /**
     * {@link #outcome} before the invalid case is cleared: {@code out} may be part written on {@link #INVALID}.
     *
     * @throws CoilwiseException where the reference path throws while evaluating
     */
    private int run(double[] z, double[] out) {
        // SpringMaker.make and SpringMaker.freeLengthDeviation.
        double s = DeviationSampler.SIGMAS;
        double gScale = 1 + z[4] * h.shearModulus() / s;
        double d = d0 + z[0] * h.wireDiameter() / s;
        double dm = dm0 + z[1] * h.meanDiameter() / s;
        double na = na0 + z[3] * h.activeCoils() / s;
        double dl0 = z[2] * h.freeLength() / s;
        double l0 = l00 + dl0;
        // The checks of the Spring record (and of the pinned wire's range) that the made spring could fail.
        if (!positive(d) || !wire.contains(d) || !positive(dm) || !positive(na) || !positive(l0)
                || dm <= Spring.MIN_INDEX * d) {
            return INVALID;
        }
        double ls = ends.solidLength(d, ends.totalCoils(na));
        if (l0 <= ls) {
            return INVALID;
        }
        double g = g0 * gScale; // the modulus band of SpringMaker.pin(gScale)
        double k = g * d * d * d * d / (8 * dm * dm * dm * na); // Spring.rate()
        return work(d, dm, na, l0, dl0, ls, g, k, out);
    }

    /** {@code Check.positive}: above zero and finite. */
    private static boolean positive(double v) {
        return v > 0 && !Double.isInfinite(v);
    }

    /** The job's part of {@link #run} for a made spring that exists. */
    abstract int work(double d, double dm, double na, double l0, double dl0, double ls, double g, double k, double[] out);

    /** Arrest: {@link Installation.Buffer}, i.e. the arrest branch of the evaluator; a pocket keeps its length. */
    static final class Buffer extends SampleEvaluator {
        private final EndType ends;
        private final double mass;
        private final double speed;
        private final double push;
        private final double pocket;
        private final double deceleration;

        Buffer(Spring nominal, HalfWidths halfWidths, Requirement req, Arrest arrest) {
            super(nominal, halfWidths, req);
            this.ends = nominal.ends();
            this.mass = arrest.mass();
            this.speed = arrest.contactSpeed();
            this.push = arrest.pushForce();
            this.pocket = req.envelope().pocketLength().orElse(Double.NaN);
            this.deceleration = req.limits().deceleration().orElse(Double.NaN);
        }

        @Override
        List<Figure> figures() {
            return Installation.Buffer.FIGURES;
        }

        @Override
        int work(double d, double dm, double na, double l0, double dl0, double ls, double g, double k, double[] out) {
            double preload = Double.isNaN(pocket) ? 0 : Math.max(0, l0 - pocket);
            double f0 = k * preload;
            double work = ArrestBalance.maxCompression(k, mass, speed, push, f0);
            double peak = ArrestBalance.peakForce(k, f0, work);
            double decel = ArrestBalance.peakDeceleration(peak, push, mass);
            double tau = Stress.corrected(peak, dm, d);
            boolean ok = limits.hold(ends, d, dm, na, l0, ls, g, k, preload, work, peak, tau, speed);
            if (!Double.isNaN(deceleration)) {
                ok &= HardLimits.atMost(decel, deceleration);
            }
            if (!Double.isNaN(pocket)) {
                ok &= HardLimits.atLeast(l0, pocket);
            }
            out[0] = work;
            out[1] = peak;
            out[2] = decel;
            out[3] = tau;
            out[4] = k;
            out[5] = ls;
            return ok ? MEETS : FAILS;
        }
    }

    /**
     * Launch: {@link Installation.Launcher}. The made spring is cocked to the nominal cocked length, throws to the
     * height that gives, and must land in the apex band; then every limit is checked as the evaluator does for a
     * launch to exactly that height (it solves the cocked compression afresh, which lands within rounding of x).
     */
    static final class Launcher extends SampleEvaluator {
        private final EndType ends;
        private final double mass;
        private final double angle;
        private final double efficiency;
        private final double density;
        private final double cocked;
        private final double sine;
        private final double lowest;
        private final double highest;

        Launcher(Spring nominal, HalfWidths halfWidths, Requirement req, Launch launch, double cocked,
                 ScatterSettings settings) {
            super(nominal, halfWidths, req);
            this.ends = nominal.ends();
            this.mass = launch.mass();
            this.angle = launch.angle();
            this.efficiency = launch.efficiency();
            this.density = nominal.material().density();
            this.cocked = cocked;
            this.sine = Math.sin(launch.angle());
            this.lowest = launch.height() * (1 - settings.heightShortfall());
            this.highest = launch.height() * (1 + settings.heightOvershoot());
        }

        @Override
        List<Figure> figures() {
            return Installation.Launcher.FIGURES;
        }

        @Override
        int work(double d, double dm, double na, double l0, double dl0, double ls, double g, double k, double[] out) {
            double activeMass = na * Math.PI * dm * (Math.PI * d * d / 4) * density; // Spring.activeMass()
            double x = cocked + dl0;
            double rise = LaunchBalance.height(k, x, mass, activeMass, angle, efficiency);
            double force = k * x;
            double apex = rise + dl0 * sine;
            out[0] = x;
            out[1] = apex;
            out[2] = force;
            out[3] = Stress.corrected(force, dm, d);
            out[4] = k;
            out[5] = ls;
            if (rise <= 0 || apex < lowest || apex > highest) {
                return FAILS;
            }
            if (Double.isInfinite(rise)) {
                return INVALID; // the reference path's Launch record refuses an infinite height
            }
            // The evaluator's launch branch for a launch to height `rise`.
            double work = LaunchBalance.cockedCompression(k, rise, mass, activeMass, angle, efficiency);
            double peak = k * work;
            double speed = LaunchBalance.exitSpeed(k, work, mass, activeMass, angle, efficiency);
            double tau = Stress.corrected(peak, dm, d);
            return limits.hold(ends, d, dm, na, l0, ls, g, k, 0, work, peak, tau, speed) ? MEETS : FAILS;
        }
    }
}
