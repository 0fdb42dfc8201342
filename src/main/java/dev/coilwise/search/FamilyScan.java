package dev.coilwise.search;

import dev.coilwise.mechanics.ArrestBalance;
import dev.coilwise.mechanics.HardLimits;
import dev.coilwise.mechanics.LaunchBalance;
import dev.coilwise.mechanics.Stress;
import dev.coilwise.mechanics.Surge;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.Launch;
import dev.coilwise.model.RankBy;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.SpringOptions;
import java.util.Arrays;
import java.util.Comparator;
import java.util.concurrent.atomic.DoubleAccumulator;

/**
 * The pruned search of one family, confined to one thread (see {@link PrunedSearch} for the method). Mean diameters
 * are visited best bound first, so the incumbent is good early and the rest are cut off as soon as their bound passes
 * it.
 */
final class FamilyScan {
    /**
     * Relative slack on every comparison of a bound with the incumbent: a cell is skipped only when its bound is above
     * the incumbent by more than this, so designs that tie with the incumbent (and rounding in the bounds) are
     * always evaluated.
     */
    static final double TIE_SLACK = 1e-6;

    private final DesignSpace space;
    private final Requirement req;
    private final Family f;
    private final Grid g;
    private final FamilyBest acc;
    private final HardLimits limits;
    private final CriterionBound bound;
    private final double d;
    private final double gd4;
    private final double xi;
    private final Arrest arrest;
    private final Launch launch;
    private final double pocket;
    private final double energy;
    private final double push;
    private final double stroke;
    private final double maxFree;
    private final double quantum;
    private final FatigueBound fatigue;
    /** Smallest criterion value met by any family, or null when every family's own best is wanted. */
    private final DoubleAccumulator leader;
    /** The peak-force and deceleration limits as one force cap, N (+∞ when none). */
    private double forceCap;
    private double lastForce = Double.NaN;
    private RateBounds lastRates;

    private FamilyScan(DesignSpace space, Family f, DoubleAccumulator leader) {
        this.leader = leader;
        this.space = space;
        this.req = space.requirement();
        this.f = f;
        this.g = space.grid();
        this.acc = new FamilyBest(f, space);
        this.limits = HardLimits.of(req, f.material(), f.wireDiameter());
        this.bound = new CriterionBound(req, f, limits.shearModulus());
        this.d = f.wireDiameter();
        this.gd4 = limits.shearModulus() * d * d * d * d;
        this.xi = req.spring().clashAllowance();
        this.arrest = req.job() instanceof Arrest a ? a : null;
        this.launch = req.job() instanceof Launch l ? l : null;
        this.pocket = arrest != null && req.envelope().pocketLength().isPresent()
                ? req.envelope().pocketLength().getAsDouble() : Double.NaN;
        this.energy = arrest == null ? 0 : arrest.kineticEnergy();
        this.push = arrest == null ? 0 : arrest.pushForce();
        this.stroke = req.limits().stroke();
        this.maxFree = req.envelope().maxFreeLength().orElse(Double.POSITIVE_INFINITY);
        this.quantum = bound.quantum(g);
        this.fatigue = FatigueBound.of(req, f, f.material().tensileStrength(d));
    }

    /** Searches family {@code f} of {@code space}; returns its best design and counts. */
    static FamilyBest search(DesignSpace space, Family f) {
        return search(space, f, null);
    }

    /**
     * Searches family {@code f}, skipping also every cell whose bound is above {@code leader}, the smallest criterion
     * value found so far by any family (shared between threads). The family's result is then its best only if that
     * can beat every other family; the overall best is still found exactly, but counts depend on thread timing.
     */
    static FamilyBest search(DesignSpace space, Family f, DoubleAccumulator leader) {
        FamilyScan scan = new FamilyScan(space, f, leader);
        scan.run();
        return scan.acc;
    }

    private void run() {
        double speed = arrest != null ? arrest.contactSpeed() : launch.requiredExitSpeed();
        double vLim = Surge.speedLimit(limits.allowableStress(), f.material().density(), limits.shearModulus());
        if (speed > vLim * (1 + 1e-6)) {
            return; // the surge limit depends on the family alone (a launch leaves faster than it is asked to, never slower)
        }
        if (fatigue.impossible() && (launch != null || energy > 0 || !f.material().steel())) {
            return; // the fatigue check gives n = 0 to every design of the family (its working stress range is never 0)
        }
        SpringOptions opt = req.spring();
        long[] dr = g.meanDiameterRange(d, opt);
        long dLo = dr[0];
        long dHi = dr[1];
        if (req.envelope().rod().isPresent()) {
            double rod = req.envelope().rod().getAsDouble();
            dLo = Math.max(dLo, g.lengthIndexAtLeast(rod + req.envelope().clearance().of(rod) + d) - 1);
        }
        if (req.envelope().bore().isPresent()) {
            double bore = req.envelope().bore().getAsDouble();
            dHi = Math.min(dHi, g.lengthIndexAtMost(bore - req.envelope().clearance().of(bore) - d) + 1);
        }
        if (dHi < dLo) {
            return;
        }
        long[] coils = g.coilRange(opt);
        if (req.envelope().maxFreeLength().isPresent()) { // Ls = d(Na + extra) < L0 ≤ Lmax
            double extra = f.ends().solidLength(d, f.ends().totalCoils(0)) / d;
            coils[1] = Math.min(coils[1], (long) Math.ceil((maxFree / d - extra) / Grid.COIL_STEP) + 1);
        }
        if (coils[1] < coils[0] || leader != null && beaten(bound.overFamily(g.length(dLo), g.length(dHi), g.coils(coils[0]),
                g.coils(coils[1])))) {
            return; // only when another family's best is known: the family's own incumbent is still empty
        }
        forceCap = req.limits().peakForce().orElse(Double.POSITIVE_INFINITY);
        if (arrest != null && req.limits().deceleration().isPresent()) {
            forceCap = Math.min(forceCap, arrest.mass() * req.limits().deceleration().getAsDouble() + push);
        }
        // Plan: the bound of every diameter, without allocation. Visit best bound first (ties by diameter), so the
        // incumbent is good early; every diameter's own bound is still compared with it when its turn comes.
        int size = (int) (dHi - dLo + 1);
        long[] order = new long[size];
        double[] bounds = new double[size];
        double[] masses = new double[size];
        long[] lows = new long[size];
        long[] highs = new long[size];
        long[] window = new long[2];
        int n = 0;
        for (int i = 0; i < size; i++) {
            double dm = g.length(dLo + i);
            if (coilWindow(dm, coils, window)) {
                bounds[i] = bound.at(dm, g.coils(bound.fallsWithCoils() ? window[1] : window[0]));
                masses[i] = bound.mass(dm, g.coils(window[0]));
                lows[i] = window[0];
                highs[i] = window[1];
                order[n++] = (long) Float.floatToIntBits((float) bounds[i]) << 32 | i;
            }
        }
        Arrays.sort(order, 0, n);
        lightestFirstAmongTies(order, n, masses);
        for (int k = 0; k < n; k++) {
            int i = (int) order[k];
            if (!beaten(bounds[i], masses[i])) {
                Cells c = cells(g.length(dLo + i), lows[i], highs[i]);
                if (c != null && !beaten(c.bound(), c.mass())) {
                    searchDiameter(c);
                }
            }
        }
    }

    /**
     * The active-coil window at one mean diameter, with the criterion's bound over it.
     *
     * @param mass       the lightest spring of the window, kg
     * @param solidForce force at which the stress reaches the allowable at this diameter, N
     * @param maxForce   the smallest cap on the peak force at this diameter, N
     */
    private record Cells(double dm, long nLo, long nHi, double bound, double mass, double solidForce,
                         double maxForce) {
    }

    /** Within each run of equal (float) bounds in {@code order}, puts the lighter diameters first. */
    private static void lightestFirstAmongTies(long[] order, int n, double[] masses) {
        int start = 0;
        while (start < n) {
            int end = start + 1;
            while (end < n && order[end] >>> 32 == order[start] >>> 32) {
                end++;
            }
            if (end - start > 1) {
                long high = order[start] & 0xFFFF_FFFF_0000_0000L;
                long[] run = new long[end - start];
                for (int k = start; k < end; k++) {
                    int i = (int) order[k];
                    run[k - start] = (long) Float.floatToIntBits((float) masses[i]) << 32 | i;
                }
                Arrays.sort(run);
                for (int k = start; k < end; k++) {
                    order[k] = high | (run[k - start] & 0xFFFF_FFFFL);
                }
            }
            start = end;
        }
    }

    /**
     * The active-coil window at mean diameter {@code dm} from the force cap and {@link RateBounds}, into
     * {@code window}; false when empty.
     */
    private boolean coilWindow(double dm, long[] coils, long[] window) {
        double fAllow = Stress.forceFor(limits.allowableStress(), dm, d);
        double maxForce = Math.min(forceCap, req.spring().solidSafe() ? fAllow / (1 + xi) : fAllow);
        if (Double.isNaN(pocket)) {
            maxForce = Math.min(maxForce, fatigue.forceCap(Stress.corrected(1, dm, d)));
        }
        RateBounds rb = maxForce == lastForce ? lastRates : RateBounds.of(req, maxForce * (1 + TIE_SLACK));
        lastForce = maxForce;
        lastRates = rb;
        if (rb.empty()) {
            return false;
        }
        double naPerRate = gd4 / (8 * dm * dm * dm); // Na = naPerRate / k
        long nLo = coils[0];
        long nHi = coils[1];
        if (rb.high() < Double.POSITIVE_INFINITY) {
            nLo = Math.max(nLo, (long) Math.floor(naPerRate / rb.high() / Grid.COIL_STEP) - 1);
        }
        if (rb.low() > 0) {
            nHi = Math.min(nHi, (long) Math.ceil(naPerRate / rb.low() / Grid.COIL_STEP) + 1);
        }
        window[0] = nLo;
        window[1] = nHi;
        return nLo <= nHi;
    }

    /** The cells of one mean diameter: its {@link #coilWindow} narrowed by coil bind or the free-length limit. */
    private Cells cells(double dm, long nLo, long nHi) {
        double fAllow = Stress.forceFor(limits.allowableStress(), dm, d);
        double maxForce = Math.min(forceCap, req.spring().solidSafe() ? fAllow / (1 + xi) : fAllow);
        if (!Double.isNaN(pocket)) {
            nHi = Math.min(nHi, lastBindable(dm, nLo, nHi) + 2);
        } else if (maxFree < Double.POSITIVE_INFINITY && nLo <= nHi) {
            nHi = Math.min(nHi, lastFitting(dm, nLo, nHi) + 2);
        }
        if (nLo > nHi) {
            return null;
        }
        return new Cells(dm, nLo, nHi, bound.at(dm, g.coils(bound.fallsWithCoils() ? nHi : nLo)),
                bound.mass(dm, g.coils(nLo)), fAllow, maxForce);
    }

    /**
     * The largest coil index in [nLo, nHi] at which {@link PreloadWindow#bindPossible} holds (nLo − 1 when none), by
     * bisection, since it holds up to some count and fails beyond it. The caller widens the result by two steps.
     */
    private long lastBindable(double dm, long nLo, long nHi) {
        return lastHolding(nLo, nHi, jn -> {
            double na = g.coils(jn);
            double k = gd4 / (8 * dm * dm * dm * na);
            return PreloadWindow.bindPossible(k, f.ends().solidLength(d, f.ends().totalCoils(na)), pocket, energy, push,
                    xi);
        });
    }

    /**
     * Without a pocket: the largest coil index in [nLo, nHi] whose shortest free length, Ls + (1 + ξ)·x with x the
     * massless working deflection (a lower bound for a launch), is within the free-length limit (nLo − 1 when none),
     * by bisection: both terms grow with Na. The caller widens the result by two steps.
     */
    private long lastFitting(double dm, long nLo, long nHi) {
        return lastHolding(nLo, nHi, jn -> {
            double na = g.coils(jn);
            double k = gd4 / (8 * dm * dm * dm * na);
            double x = arrest != null ? ArrestBalance.maxCompression(k, arrest.mass(), arrest.contactSpeed(), push, 0)
                    : LaunchBalance.cockedCompression(k, launch.height(), launch.mass(), 0, launch.angle(),
                            launch.efficiency());
            return f.ends().solidLength(d, f.ends().totalCoils(na)) + (1 + xi) * x <= maxFree * (1 + TIE_SLACK);
        });
    }

    /**
     * The largest index in [lo, hi] at which {@code holds} is true (lo − 1 when none), for a test that holds up to some
     * index and fails beyond it, by bisection.
     */
    private static long lastHolding(long lo, long hi, java.util.function.LongPredicate holds) {
        long good = lo - 1;
        long bad = hi + 1;
        while (bad - good > 1) {
            long mid = (good + bad) >>> 1;
            if (holds.test(mid)) {
                good = mid;
            } else {
                bad = mid;
            }
        }
        return good;
    }

    private boolean beaten(double lowerBound) {
        double best = leader == null ? acc.incumbent() : Math.min(acc.incumbent(), leader.get());
        return lowerBound > best * (1 + TIE_SLACK);
    }

    /** Offers one design to the family (and, when searching for the overall best only, to the shared bound). */
    private boolean offer(double dm, double na, double l0) {
        boolean feasible = acc.offer(limits, dm, na, l0);
        if (feasible && leader != null) {
            leader.accumulate(acc.incumbent());
        }
        return feasible;
    }

    /**
     * Whether no design with criterion at least {@code lowerBound} and mass at least {@code massBound} can beat the
     * incumbent: its criterion is higher, or (for a quantised criterion) it can at best tie and is heavier.
     */
    private boolean beaten(double lowerBound, double massBound) {
        return beaten(lowerBound) || quantum > 0 && lowerBound > acc.incumbent() - quantum / 2
                && massBound > acc.incumbentMass() * (1 + TIE_SLACK);
    }

    private void searchDiameter(Cells c) {
        if (bound.fallsWithCoils()) {
            for (long jn = c.nHi(); jn >= c.nLo() && !beaten(bound.at(c.dm(), g.coils(jn))); jn--) { // quantum 0
                if (!beaten(bound.tight(c.dm(), g.coils(jn)))) {
                    searchCell(c, g.coils(jn));
                }
            }
            return;
        }
        boolean firstWins = Objective.nonDecreasingInCoils(req.ranking().by());
        for (long jn = c.nLo(); jn <= c.nHi()
                && !beaten(bound.at(c.dm(), g.coils(jn)), bound.mass(c.dm(), g.coils(jn))); jn++) {
            if (beaten(bound.tight(c.dm(), g.coils(jn)), bound.mass(c.dm(), g.coils(jn)))) {
                continue;
            }
            if (searchCell(c, g.coils(jn)) && firstWins) {
                return;
            }
        }
    }

    /** Tries the free lengths of one (D, Na) cell; returns whether a feasible design was found. */
    private boolean searchCell(Cells c, double na) {
        double dm = c.dm();
        double ls = f.ends().solidLength(d, f.ends().totalCoils(na));
        double k = gd4 / (8 * dm * dm * dm * na); // as Spring.rate()
        if (!Double.isNaN(pocket)) {
            return searchPocket(c, na, k, ls);
        }
        long j0 = space.firstFreeLengthIndex(ls);
        long jCap = g.lengthIndexAtMost(space.freeLengthCap(c.solidForce(), ls, k));
        double work = arrest != null
                ? ArrestBalance.maxCompression(k, arrest.mass(), arrest.contactSpeed(), arrest.pushForce(), 0)
                : LaunchBalance.cockedCompression(k, launch.height(), launch.mass(),
                        na * Math.PI * dm * (Math.PI * d * d / 4) * f.material().density(), launch.angle(),
                        launch.efficiency());
        long j = Math.max(j0, g.lengthIndexAtLeast(ls + (1 + xi) * work));
        while (j > j0 && coilBindHolds(g.length(j - 1), ls, work)) {
            j--;
        }
        while (!coilBindHolds(g.length(j), ls, work)) {
            j++;
        }
        return j <= jCap && offer(dm, na, g.length(j));
    }

    /** The coil-bind rule exactly as the evaluator applies it. */
    private boolean coilBindHolds(double l0, double ls, double total) {
        return HardLimits.atMost(total, (l0 - ls) / (1 + xi));
    }

    private boolean searchPocket(Cells c, double na, double k, double ls) {
        double dm = c.dm();
        PreloadWindow w = PreloadWindow.of(k, ls, pocket, energy, push, stroke, c.maxForce() * (1 + TIE_SLACK), xi,
                req.spring().solidSafe() ? c.solidForce() * (1 + TIE_SLACK) : Double.POSITIVE_INFINITY, maxFree);
        long lo = g.lengthIndexAtLeast(pocket) - 1;
        long hi = Long.MAX_VALUE;
        if (w.low() > Double.NEGATIVE_INFINITY) {
            lo = Math.max(lo, g.lengthIndexAtLeast(pocket + w.low()) - 1);
        }
        if (w.high() < Double.POSITIVE_INFINITY) {
            hi = g.lengthIndexAtMost(pocket + w.high()) + 1;
        }
        if (lo > hi) {
            return false;
        }
        if (!req.envelope().guided()) {
            hi = Math.min(hi, g.lengthIndexAtMost(longestUnbuckled(dm, k)) + 1);
        }
        if (req.envelope().bore().isPresent()) {
            hi = Math.min(hi, g.lengthIndexAtMost(longestInBore(dm, na, ls)) + 1);
        }
        double[] f0 = fatigue.preloadForces(Stress.corrected(1, dm, d), k, energy, push);
        if (f0 != null) {
            lo = Math.max(lo, g.lengthIndexAtLeast(pocket + Math.max(0, f0[0]) / k) - 1);
            hi = Math.min(hi, g.lengthIndexAtMost(pocket + Math.max(0, f0[1]) / k) + 1);
            if (f0[1] < 0) {
                return false;
            }
        }
        lo = Math.max(lo, space.firstFreeLengthIndex(ls));
        hi = Math.min(hi, g.lengthIndexAtMost(space.freeLengthCap(c.solidForce(), ls, k)));
        if (lo <= hi && !HardLimits.atLeast(g.length(lo), pocket)) {
            lo++; // the pocket rule exactly as the evaluator applies it
        }
        if (lo > hi) {
            return false;
        }
        if (req.ranking().by() == RankBy.PEAK_FORCE) {
            return searchPocketByPeak(dm, na, k, lo, hi);
        }
        for (long j = lo; j <= hi; j++) {
            if (offer(dm, na, g.length(j))) {
                return true; // every other criterion is the same across the cell, and the shorter free length wins ties
            }
        }
        return false;
    }

    /**
     * Free lengths of a pocket cell for the peak-force criterion, in order of rising peak force: outwards from the
     * preload that equals the push, P(F0) = Fc + √(2kE + (F0 − Fc)²), stopping on each side once P passes the
     * incumbent.
     */
    private boolean searchPocketByPeak(double dm, double na, double k, long lo, long hi) {
        double fc = arrest.pushForce();
        long mid = Math.min(hi, Math.max(lo, g.lengthIndexAtMost(pocket + Math.max(0, fc) / k)));
        long down = mid;
        long up = mid + 1;
        boolean found = false;
        while (down >= lo || up <= hi) {
            double pDown = down >= lo ? peakAt(k, down) : Double.POSITIVE_INFINITY;
            double pUp = up <= hi ? peakAt(k, up) : Double.POSITIVE_INFINITY;
            boolean takeDown = pDown <= pUp;
            double p = takeDown ? pDown : pUp;
            if (beaten(p) || p == Double.POSITIVE_INFINITY) {
                return found;
            }
            long j = takeDown ? down-- : up++;
            found |= offer(dm, na, g.length(j));
        }
        return found;
    }

    /**
     * Longest free length at which an unguided spring of rate {@code k} at mean diameter {@code dm} can pass the
     * buckling check with any preload, m. The total deflection u + x is smallest when the preload equals the push
     * (d(u + x)/du = (F0 − Fc)/(P − Fc)): T = Fc/k + √(2E/k) for Fc &gt; 0, else the deflection without preload. The
     * critical deflection y_cr = C1'(L0 − √(L0² − K)), K = C2'·D²/α² (Shigley's MED 9th ed., Eq. 10-10, as in
     * {@link dev.coilwise.mechanics.Buckling}), falls as L0 grows, so y_cr ≥ T needs L0 ≤ (K + t²)/(2t), t = T/C1',
     * unless the spring is short enough to be stable outright.
     */
    private double longestUnbuckled(double dm, double k) {
        double e = limits.youngsModulus();
        double gm = limits.shearModulus();
        double alpha = req.spring().seating().alpha();
        double c1 = e / (2 * (e - gm));
        double kk = 2 * Math.PI * Math.PI * (e - gm) / (2 * gm + e) * dm * dm / (alpha * alpha);
        double stable = Math.sqrt(kk);
        if (f.material().steel()) {
            stable = Math.max(stable, dev.coilwise.mechanics.Buckling.absoluteStabilityLength(dm, req.spring().seating()));
        }
        double total = push > 0 ? push / k + Math.sqrt(2 * energy / k)
                : ArrestBalance.maxCompression(k, arrest.mass(), arrest.contactSpeed(), push, 0);
        double t = total / c1 * (1 - TIE_SLACK);
        return t > 0 ? Math.max(stable, (kk + t * t) / (2 * t)) : Double.POSITIVE_INFINITY;
    }

    /**
     * Longest free length whose outer diameter at solid fits the bore, m: {@link dev.coilwise.mechanics.SolidGrowth}
     * OD_s = √(D² + (p² − d²)/π²) + d grows with the pitch p, so p² ≤ π²((B − d)² − D²) + d², B the bore less its
     * clearance, and L0 follows from the pitch as in {@link dev.coilwise.model.Spring#pitch()}.
     */
    private double longestInBore(double dm, double na, double ls) {
        double bore = req.envelope().bore().getAsDouble();
        double room = (bore - req.envelope().clearance().of(bore)) * (1 + TIE_SLACK) - d;
        double p2 = Math.PI * Math.PI * (room * room - dm * dm) + d * d;
        if (room < dm || p2 < 0) {
            return Double.NEGATIVE_INFINITY;
        }
        double p = Math.sqrt(p2);
        return f.ends() == dev.coilwise.model.EndType.PLAIN_GROUND ? p * f.ends().totalCoils(na) : p * na + ls - na * d;
    }

    private double peakAt(double k, long j) {
        double f0 = k * Math.max(0, g.length(j) - pocket);
        double b = f0 - arrest.pushForce();
        return arrest.pushForce() + Math.sqrt(2 * k * arrest.kineticEnergy() + b * b);
    }
}
