package dev.coilwise.search;

import dev.coilwise.mechanics.ArrestBalance;
import dev.coilwise.mechanics.LaunchBalance;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.Gravity;
import dev.coilwise.model.Launch;
import dev.coilwise.model.RankBy;
import dev.coilwise.model.Requirement;

/**
 * Lower bounds of the ranking criterion over every design of one family at a mean diameter D and a number of active
 * coils Na (any free length). Each bound never exceeds the criterion that {@link Objective#value} gives for any such
 * design, so a cell whose bound is above the family's incumbent cannot hold the family's best.
 *
 * <ul>
 *   <li>mass, robustness: Nt·π·D·(πd²/4)·ρ, the mass itself (it does not depend on the free length); cost: the mass
 *       times the relative cost. Both rise with Na.</li>
 *   <li>solid length: Ls(Na), exact; rises with Na. Outer diameter: D + d, exact.</li>
 *   <li>free length: L0 ≥ Ls + (1 + ξ)·x by the coil-bind rule, with x the massless working deflection (exact for an
 *       arrest without a pocket, a lower bound for a launch since the spring's own mass only adds to it; 0 with a
 *       pocket, where L0 ≥ pocket instead); rises with Na.</li>
 *   <li>peak force: arrest, Fc + √(2kE + n²) with n = |Fc| without a pocket (exact); with one, n = max(0, −Fc,
 *       E/s − ks/2), since the preload F0 is at least 0 and, for the load to stop within the stroke s, at least
 *       E/s + Fc − ks/2 (see {@link PreloadWindow}), and P grows with |F0 − Fc|; 2kE + n² still rises with k. Launch,
 *       (b + √(b² + 2ηkc))/η, the massless cocking force. Both fall as Na rises (k falls).</li>
 * </ul>
 */
final class CriterionBound {
    private final RankBy by;
    private final Family family;
    private final double area;
    private final double gd4;
    private final double xi;
    private final Arrest arrest;
    private final Launch launch;
    private final double pocket;
    private final double push;
    private final double energy;
    /** The stroke limit, widened by a relative 10⁻⁶ so that the bound stays below designs that meet it to rounding, m. */
    private final double stroke;
    /** n of the arrest bound: |Fc| without a pocket, max(0, −Fc) with one, N. */
    private final double slack;
    private final double eta;
    private final double lift;
    private final double kinetic;

    CriterionBound(Requirement req, Family family, double shearModulus) {
        this.by = req.ranking().by();
        this.family = family;
        double d = family.wireDiameter();
        this.area = Math.PI * d * d / 4;
        this.gd4 = shearModulus * d * d * d * d;
        this.xi = req.spring().clashAllowance();
        this.arrest = req.job() instanceof Arrest a ? a : null;
        this.launch = req.job() instanceof Launch l ? l : null;
        this.pocket = arrest != null && req.envelope().pocketLength().isPresent()
                ? req.envelope().pocketLength().getAsDouble() : Double.NaN;
        this.push = arrest == null ? 0 : arrest.pushForce();
        this.energy = arrest == null ? 0 : arrest.kineticEnergy();
        this.stroke = req.limits().stroke() * (1 + 1e-6);
        this.slack = Double.isNaN(pocket) ? Math.abs(push) : Math.max(0, -push);
        this.eta = launch == null ? 1 : launch.efficiency();
        this.lift = launch == null ? 0 : launch.mass() * Gravity.STANDARD * Math.sin(launch.angle());
        double v = launch == null ? 0 : launch.requiredExitSpeed();
        this.kinetic = launch == null ? 0 : 0.5 * launch.mass() * v * v;
    }

    /** Whether the bound falls (rather than rises) as active coils are added at a fixed D. */
    boolean fallsWithCoils() {
        return by == RankBy.PEAK_FORCE;
    }

    /**
     * The smallest difference between two unequal values of the criterion within the family, SI (0 when the
     * criterion is not quantised): the grid step for the free length and the outer diameter, d/4 for the solid
     * length (quarter coils). Designs can tie on these criteria, and ties go to the lighter spring.
     */
    double quantum(Grid g) {
        return switch (by) {
            case FREE_LENGTH, OUTER_DIAMETER -> g.step();
            case SOLID_LENGTH -> family.wireDiameter() * Grid.COIL_STEP;
            default -> 0;
        };
    }

    /** The spring mass at mean diameter {@code dm} (m) and {@code na} active coils, kg (the first tie-break). */
    double mass(double dm, double na) {
        return family.ends().totalCoils(na) * Math.PI * dm * area * family.material().density(); // as Spring.mass()
    }

    /** The lower bound at mean diameter {@code dm} (m) and {@code na} active coils. */
    double at(double dm, double na) {
        double d = family.wireDiameter();
        double nt = family.ends().totalCoils(na);
        return switch (by) {
            case MASS, ROBUSTNESS -> mass(dm, na);
            case COST -> mass(dm, na) * family.material().relativeCost();
            case SOLID_LENGTH -> family.ends().solidLength(d, nt);
            case OUTER_DIAMETER -> dm + d;
            case FREE_LENGTH -> freeLength(dm, na, family.ends().solidLength(d, nt));
            case PEAK_FORCE -> peakForce(gd4 / (8 * dm * dm * dm * na));
        };
    }

    /**
     * A bound over every design of the family with mean diameter in [dLo, dHi] and active coils in [nLo, nHi]: the
     * criteria that rise with D and Na at their low ends, the peak force (which falls with both, k ∝ 1/(D³Na)) at
     * their high ends, and the free length through the solid length alone.
     */
    double overFamily(double dLo, double dHi, double nLo, double nHi) {
        return switch (by) {
            case PEAK_FORCE -> at(dHi, nHi);
            case FREE_LENGTH -> Double.isNaN(pocket)
                    ? family.ends().solidLength(family.wireDiameter(), family.ends().totalCoils(nLo))
                    : freeLength(dLo, nLo, family.ends().solidLength(family.wireDiameter(), family.ends().totalCoils(nLo)));
            default -> at(dLo, nLo);
        };
    }

    /**
     * A bound for the one cell (D, Na), at least {@link #at}: for a launch, the peak force and the shortest free length
     * with the spring's own active mass Na·π·D·(πd²/4)·ρ in the balance (the cocking force is then exact). Unlike
     * {@link #at} it need not move monotonically with Na, so it may skip a cell but not end a loop.
     */
    double tight(double dm, double na) {
        if (launch == null || by != RankBy.PEAK_FORCE && by != RankBy.FREE_LENGTH) {
            return at(dm, na);
        }
        double k = gd4 / (8 * dm * dm * dm * na);
        double activeMass = na * Math.PI * dm * area * family.material().density(); // as Spring.activeMass()
        double x = LaunchBalance.cockedCompression(k, launch.height(), launch.mass(), activeMass, launch.angle(),
                launch.efficiency());
        return by == RankBy.PEAK_FORCE ? k * x
                : family.ends().solidLength(family.wireDiameter(), family.ends().totalCoils(na)) + (1 + xi) * x;
    }

    private double freeLength(double dm, double na, double ls) {
        if (!Double.isNaN(pocket)) {
            return Math.max(pocket * (1 - 1e-9), ls); // the pocket margin's own tolerance
        }
        double k = gd4 / (8 * dm * dm * dm * na);
        double x = arrest != null ? ArrestBalance.maxCompression(k, arrest.mass(), arrest.contactSpeed(),
                push, 0)
                : LaunchBalance.cockedCompression(k, launch.height(), launch.mass(), 0, launch.angle(),
                        launch.efficiency());
        return ls + (1 + xi) * x;
    }

    private double peakForce(double k) {
        if (arrest != null) {
            double n = Double.isNaN(pocket) ? slack : Math.max(slack, energy / stroke - 0.5 * k * stroke);
            return push + Math.sqrt(2 * k * energy + n * n);
        }
        return (lift + Math.sqrt(lift * lift + 2 * eta * k * kinetic)) / eta;
    }
}
