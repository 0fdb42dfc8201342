package dev.coilwise.search;

import dev.coilwise.model.Spring;
import java.util.ArrayList;
import java.util.List;

/**
 * Evaluates every candidate of the declared grid. Kept as the oracle for tests and benchmarks of
 * {@link PrunedSearch}; far too slow to be the default.
 */
public final class BruteForceSearch implements SpringSearch {

    @Override
    public SearchResult run(DesignSpace space) {
        Grid g = space.grid();
        var opt = space.requirement().spring();
        long[] coils = g.coilRange(opt);
        List<Candidate> best = new ArrayList<>();
        long evaluated = 0;
        long feasible = 0;
        for (Family f : space.families()) {
            FamilyBest acc = new FamilyBest(f, space);
            double d = f.wireDiameter();
            long[] dr = g.meanDiameterRange(d, opt);
            for (long jd = dr[0]; jd <= dr[1]; jd++) {
                double dm = g.length(jd);
                for (long jn = coils[0]; jn <= coils[1]; jn++) {
                    double na = g.coils(jn);
                    double ls = f.ends().solidLength(d, f.ends().totalCoils(na));
                    long j0 = space.firstFreeLengthIndex(ls);
                    Spring probe = new Spring(f.material(), f.ends(), d, dm, na, g.length(j0));
                    long j1 = g.lengthIndexAtMost(space.freeLengthCap(f, dm, ls, probe.rate()));
                    for (long jl = j0; jl <= j1; jl++) {
                        acc.offer(probe.withFreeLength(g.length(jl)));
                    }
                }
            }
            evaluated += acc.evaluated;
            feasible += acc.feasible;
            if (acc.best() != null) {
                best.add(acc.best());
            }
        }
        best.sort(Objective.comparator(space.requirement().ranking().by()));
        return new SearchResult(space, best, evaluated, feasible);
    }
}
