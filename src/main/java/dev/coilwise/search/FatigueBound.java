package dev.coilwise.search;

import dev.coilwise.mechanics.CyclicStressTable;
import dev.coilwise.mechanics.Fatigue;
import dev.coilwise.mechanics.FatigueCriterion;
import dev.coilwise.mechanics.FatigueStrength;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.SpringOptions;

/**
 * A necessary condition from the fatigue check on the preload of an arrest into a pocket. Whenever
 * {@link Fatigue} applies (10⁴ cycles or more, a steel), the reported safety factor is the smallest of several
 * criteria, among them Goodman through the cyclic-table point along the proportional load line:
 * n = 1/(τa/S_se + τm/S_su) (Shigley's MED 9th ed., Sec. 10-9, as {@link FatigueCriterion#GOODMAN} computes it). With
 * τ = s·F (s the corrected stress per newton at this diameter), τa = s(P − F0)/2, τm = s(P + F0)/2 and
 * P = Fc + √(2kE + y²), y = F0 − Fc, the requirement n ≥ margin reads α√(2kE + y²) ≤ A + βy with α = 1/S_se + 1/S_su,
 * β = 1/S_se − 1/S_su, A = 2/(s·margin) − (α − β)Fc: the y between the roots of
 * (α² − β²)y² − 2Aβy + 2α²kE − A² = 0 (none when A² &lt; 2kE(α² − β²)). Used only when E &gt; 0, so that τa &gt; 0.
 */
final class FatigueBound {
    private final boolean applies;
    private final boolean impossible;
    private final double alpha;
    private final double beta;
    private final double margin;

    private FatigueBound(boolean applies, boolean impossible, double alpha, double beta, double margin) {
        this.applies = applies;
        this.impossible = impossible;
        this.alpha = alpha;
        this.beta = beta;
        this.margin = margin;
    }

    /** The bound for wire {@code f} (tensile strength {@code sut}, Pa) under {@code req}. */
    static FatigueBound of(Requirement req, Family f, double sut) {
        SpringOptions o = req.spring();
        if (o.cycles().isEmpty() || o.cycles().getAsDouble() < Fatigue.STATIC_BELOW) {
            return new FatigueBound(false, false, 0, 0, 0);
        }
        if (!f.material().steel()) {
            return new FatigueBound(true, true, 0, 0, 0); // no fatigue data: the check gives n = 0
        }
        double ssu = FatigueCriterion.ULTIMATE_SHEAR_RATIO * sut;
        double fraction = CyclicStressTable.forMaterial(f.material()).fraction(o.cycles().getAsDouble(), o.shotPeened());
        FatigueStrength point = FatigueStrength.repeated(fraction * sut, "cyclic_table");
        if (point.mean() >= ssu) {
            return new FatigueBound(true, true, 0, 0, 0); // the criterion gives n = 0
        }
        double sse = FatigueCriterion.GOODMAN.enduranceStrength(point, ssu);
        return new FatigueBound(true, false, 1 / sse + 1 / ssu, 1 / sse - 1 / ssu, o.fatigueMargin());
    }

    /**
     * Without preload (F0 = 0) the same condition caps the peak force: P ≤ 2/(s·α·margin), N (+∞ when the bound does
     * not apply).
     */
    double forceCap(double stressPerNewton) {
        return applies && !impossible ? 2 / (stressPerNewton * alpha * margin * (1 - 1e-6)) : Double.POSITIVE_INFINITY;
    }

    /** Whether no design of the family can pass the fatigue check. */
    boolean impossible() {
        return impossible;
    }

    /**
     * The preload forces F0 (N) that can pass, as {lowest, highest}, for a cell of rate {@code k} (N/m) whose
     * corrected stress per newton is {@code stressPerNewton} (Pa/N); null when any preload may pass (the bound does not
     * apply), an empty range (lowest &gt; highest) when none can.
     */
    double[] preloadForces(double stressPerNewton, double k, double energy, double push) {
        if (!applies || energy <= 0) {
            return null;
        }
        if (impossible) {
            return new double[] {1, 0};
        }
        double slack = 1e-6; // on the margin: rounding must never exclude a design
        double a = 2 / (stressPerNewton * margin * (1 - slack)) - (alpha - beta) * push;
        double q = alpha * alpha - beta * beta;
        double r = a * a - 2 * k * energy * q;
        if (r < -1e-9 * a * a) {
            return new double[] {1, 0};
        }
        double root = alpha * Math.sqrt(Math.max(0, r));
        double y1 = (a * beta - root) / q;
        double y2 = (a * beta + root) / q;
        double low = Math.max(y1, beta > 0 ? -a / beta : Double.NEGATIVE_INFINITY);
        double width = 1e-6 * (Math.abs(y2) + Math.abs(push) + 1);
        return new double[] {push + low - width, push + y2 + width};
    }
}
