package dev.coilwise.search;

import dev.coilwise.materials.Material;
import dev.coilwise.mechanics.Margin;
import dev.coilwise.mechanics.Stress;
import dev.coilwise.mechanics.Surge;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.Launch;
import dev.coilwise.model.RankBy;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import dev.coilwise.model.SpringOptions;
import dev.coilwise.mechanics.ArrestBalance;
import dev.coilwise.mechanics.LaunchBalance;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.OptionalDouble;

/**
 * The default search: the same answer as {@link BruteForceSearch} over the same grid, visiting a small part of it.
 *
 * <p>Per family (material, ends, wire): the surge limit depends only on the family, so it is checked once. Per mean
 * diameter: the guide limits bound the diameter, {@link RateBounds} bound the rate and so the active coils, and a
 * lower bound of the ranking criterion at that diameter is compared with the family's incumbent. Per active-coil
 * count: without a pocket the working deflection does not depend on the free length and every limit other than
 * coil bind only worsens as the spring gets longer, so the one free length to try is the shortest the coil-bind
 * rule admits; with a pocket the free lengths are scanned within closed-form preload bounds. When the criterion never
 * falls as coils are added, the first feasible coil count ends the diameter. All bounds are widened by one grid step
 * and every kept candidate is evaluated in full, so the bounds only skip work and never decide feasibility.
 * Families run in parallel; each family is searched by one thread, so results and counts are the same on any
 * number of threads.
 */
public final class PrunedSearch implements SpringSearch {

    @Override
    public SearchResult run(DesignSpace space) {
        List<FamilyBest> done = space.families().parallelStream().map(f -> searchFamily(space, f)).toList();
        List<Candidate> best = new ArrayList<>(done.stream().map(FamilyBest::best).filter(Objects::nonNull).toList());
        best.sort(Objective.comparator(space.requirement().ranking().by()));
        long evaluated = done.stream().mapToLong(a -> a.evaluated).sum();
        long feasible = done.stream().mapToLong(a -> a.feasible).sum();
        return new SearchResult(space, best, evaluated, feasible);
    }

    static FamilyBest searchFamily(DesignSpace space, Family f) {
        FamilyBest acc = new FamilyBest(f, space);
        Requirement req = space.requirement();
        SpringOptions opt = req.spring();
        Grid g = space.grid();
        Material mat = f.material();
        double d = f.wireDiameter();
        double allow = mat.allowableStress(d, opt.setRemoved());
        double gMod = mat.shearModulus(d);
        double speed = req.job() instanceof Arrest a ? a.contactSpeed() : ((Launch) req.job()).requiredExitSpeed();
        double vLim = Surge.speedLimit(allow, mat.density(), gMod);
        if (speed > vLim * (1 + 1e-6)) {
            return acc;
        }
        long[] dr = g.meanDiameterRange(d, opt);
        long dLo = dr[0];
        long dHi = dr[1];
        double clearanceOf;
        if (req.envelope().rod().isPresent()) {
            double rod = req.envelope().rod().getAsDouble();
            dLo = Math.max(dLo, g.lengthIndexAtLeast(rod + req.envelope().clearance().of(rod) + d) - 1);
        }
        if (req.envelope().bore().isPresent()) {
            double bore = req.envelope().bore().getAsDouble();
            clearanceOf = req.envelope().clearance().of(bore);
            dHi = Math.min(dHi, g.lengthIndexAtMost(bore - clearanceOf - d) + 1);
        }
        long[] coils = g.coilRange(opt);
        RankBy by = req.ranking().by();
        for (long jd = dLo; jd <= dHi; jd++) {
            searchDiameter(space, f, acc, g.length(jd), allow, gMod, coils, by);
        }
        return acc;
    }

    private static void searchDiameter(DesignSpace space, Family f, FamilyBest acc, double dm, double allow,
                                       double gMod, long[] coils, RankBy by) {
        Requirement req = space.requirement();
        double d = f.wireDiameter();
        double maxForce = Stress.forceFor(allow, dm, d);
        OptionalDouble pf = req.limits().peakForce();
        if (pf.isPresent()) {
            maxForce = Math.min(maxForce, pf.getAsDouble());
        }
        if (req.job() instanceof Arrest a && req.limits().deceleration().isPresent()) {
            maxForce = Math.min(maxForce, a.mass() * req.limits().deceleration().getAsDouble() + a.pushForce());
        }
        RateBounds rb = RateBounds.of(req, maxForce);
        if (rb.empty()) {
            return;
        }
        double naPerRate = gMod * d * d * d * d / (8 * dm * dm * dm); // Na = naPerRate / k
        long nLo = coils[0];
        long nHi = coils[1];
        if (rb.high() < Double.POSITIVE_INFINITY) {
            nLo = Math.max(nLo, (long) Math.floor(naPerRate / rb.high() / Grid.COIL_STEP) - 1);
        }
        if (rb.low() > 0) {
            nHi = Math.min(nHi, (long) Math.ceil(naPerRate / rb.low() / Grid.COIL_STEP) + 1);
        }
        if (req.envelope().maxFreeLength().isPresent()) {
            double lmax = req.envelope().maxFreeLength().getAsDouble();
            double extra = f.ends().solidLength(d, f.ends().totalCoils(0)) / d; // Ls = d(Na + extra)
            nHi = Math.min(nHi, (long) Math.ceil((lmax / d - extra) / Grid.COIL_STEP) + 1);
        }
        if (nLo > nHi) {
            return;
        }
        if (lowerBound(space, f, dm, Math.max(nLo, coils[0]), Math.min(nHi, coils[1]), naPerRate, by)
                > acc.incumbent()) {
            return;
        }
        boolean firstWins = Objective.nonDecreasingInCoils(by);
        for (long jn = nLo; jn <= nHi; jn++) {
            double na = space.grid().coils(jn);
            if (firstWins && acc.incumbent() < Double.POSITIVE_INFINITY
                    && lowerBound(space, f, dm, jn, jn, naPerRate, by) > acc.incumbent()) {
                return;
            }
            if (searchCell(space, f, acc, dm, na, by, maxForce) && firstWins) {
                return;
            }
        }
    }

    /** A lower bound of the criterion over coil indices [n0, n1] at mean diameter dm. */
    private static double lowerBound(DesignSpace space, Family f, double dm, long n0, long n1, double naPerRate,
                                     RankBy by) {
        double d = f.wireDiameter();
        double na0 = space.grid().coils(n0);
        double nt0 = f.ends().totalCoils(na0);
        double area = Math.PI * d * d / 4;
        double mass = nt0 * Math.PI * dm * area * f.material().density();
        return switch (by) {
            case MASS, ROBUSTNESS -> mass * (1 - 1e-12);
            case COST -> mass * f.material().relativeCost() * (1 - 1e-12);
            case SOLID_LENGTH -> f.ends().solidLength(d, nt0) * (1 - 1e-12);
            case OUTER_DIAMETER -> (dm + d) * (1 - 1e-12);
            case FREE_LENGTH -> f.ends().solidLength(d, nt0) * (1 - 1e-12);
            case PEAK_FORCE -> 0;
        };
    }

    /** Tries the free lengths of one (D, Na) cell; returns whether a feasible design was found. */
    private static boolean searchCell(DesignSpace space, Family f, FamilyBest acc, double dm, double na, RankBy by,
                                      double maxForce) {
        Requirement req = space.requirement();
        Grid g = space.grid();
        double d = f.wireDiameter();
        double ls = f.ends().solidLength(d, f.ends().totalCoils(na));
        long j0 = space.firstFreeLengthIndex(ls);
        Spring probe = new Spring(f.material(), f.ends(), d, dm, na, g.length(j0));
        double k = probe.rate();
        long jCap = g.lengthIndexAtMost(space.freeLengthCap(f, dm, ls, k));
        double xi = req.spring().clashAllowance();
        if (req.job() instanceof Arrest a && req.envelope().pocketLength().isPresent()) {
            double pocket = req.envelope().pocketLength().getAsDouble();
            double e = a.kineticEnergy();
            double fc = a.pushForce();
            double s = req.limits().stroke();
            long lo = Math.max(j0, g.lengthIndexAtLeast(pocket) - 1);
            double f0Stroke = fc + e / s - 0.5 * k * s;
            if (f0Stroke > 0) {
                lo = Math.max(lo, g.lengthIndexAtLeast(pocket + f0Stroke / k) - 1);
            }
            long hi = jCap;
            double r = maxForce - fc;
            double root = r * r - 2 * k * e;
            if (r < 0 || root < 0) {
                return false;
            }
            double f0Force = fc + Math.sqrt(root); // peak, deceleration and stress limits: F0 <= Fc + sqrt(r^2 - 2kE)
            hi = Math.min(hi, g.lengthIndexAtMost(pocket + f0Force / k) + 1);
            if (xi > 0) { // coil bind with x >= 0: L0 - pocket <= (L0 - Ls)/(1 + xi)
                hi = Math.min(hi, g.lengthIndexAtMost((pocket * (1 + xi) - ls) / xi) + 1);
            }
            boolean found = false;
            for (long jl = lo; jl <= hi; jl++) {
                if (acc.offer(probe.withFreeLength(g.length(jl)))) {
                    found = true;
                    if (by != RankBy.PEAK_FORCE) {
                        return true;
                    }
                }
            }
            return found;
        }
        double work = req.job() instanceof Arrest a
                ? ArrestBalance.maxCompression(k, a.mass(), a.contactSpeed(), a.pushForce(), 0)
                : LaunchBalance.cockedCompression(k, ((Launch) req.job()).height(), req.job().mass(),
                        probe.activeMass(), ((Launch) req.job()).angle(), ((Launch) req.job()).efficiency());
        long j = Math.max(j0, g.lengthIndexAtLeast(ls + (1 + xi) * work));
        while (j > j0 && coilBindHolds(g.length(j - 1), ls, work, xi)) {
            j--;
        }
        while (!coilBindHolds(g.length(j), ls, work, xi)) {
            j++;
        }
        if (j > jCap) {
            return false;
        }
        return acc.offer(probe.withFreeLength(g.length(j)));
    }

    /** The coil-bind rule exactly as the evaluator applies it. */
    private static boolean coilBindHolds(double l0, double ls, double total, double xi) {
        return Margin.atMost("coil_bind", total, (l0 - ls) / (1 + xi), "m", true).holds();
    }
}
