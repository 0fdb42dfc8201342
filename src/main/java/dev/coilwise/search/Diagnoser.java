package dev.coilwise.search;

import dev.coilwise.mechanics.ArrestBalance;
import dev.coilwise.mechanics.DesignEvaluator;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.mechanics.LaunchBalance;
import dev.coilwise.mechanics.Margin;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.Launch;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;

/**
 * Explains an empty search: the work-energy bounds of {@link LimitConflict} and {@link StrengthBound}; then samples
 * every family on a coarse sub-grid (up to {@value #SAMPLES} mean diameters × {@value #SAMPLES} coil counts, each at
 * the free length the coil-bind rule asks for, and at the pocket length when there is one), counts which limits
 * fail, and keeps the designs that fail a single limit by the least.
 */
public final class Diagnoser {
    /** Samples per axis of the diagnosis sub-grid. */
    public static final int SAMPLES = 12;
    /** Near misses reported. */
    public static final int NEAREST = 5;

    private Diagnoser() {
    }

    public static Diagnosis diagnose(DesignSpace space) {
        Requirement req = space.requirement();
        Grid g = space.grid();
        long[] coils = g.coilRange(req.spring());
        Map<String, Long> counts = new TreeMap<>();
        List<NearMiss> singles = new ArrayList<>();
        long sampled = 0;
        for (Family f : space.families()) {
            double d = f.wireDiameter();
            long[] dr = g.meanDiameterRange(d, req.spring());
            for (long jd : spread(dr[0], dr[1])) {
                for (long jn : spread(coils[0], coils[1])) {
                    for (Spring s : springsFor(space, f, g.length(jd), g.coils(jn))) {
                        Evaluation e = DesignEvaluator.evaluate(s, req);
                        sampled++;
                        List<Margin> v = e.violations();
                        v.forEach(m -> counts.merge(m.key(), 1L, Long::sum));
                        if (v.size() == 1) {
                            singles.add(new NearMiss(f, e, v.get(0)));
                        }
                    }
                }
            }
        }
        Map<String, Long> sorted = new LinkedHashMap<>();
        counts.entrySet().stream().sorted(Map.Entry.<String, Long>comparingByValue().reversed())
                .forEach(en -> sorted.put(en.getKey(), en.getValue()));
        singles.sort(Comparator.comparingDouble((NearMiss n) -> -n.violated().value())
                .thenComparingInt(n -> n.family().order()));
        List<NearMiss> nearest = new ArrayList<>();
        Set<String> seen = new HashSet<>();
        for (NearMiss n : singles) {
            if (nearest.size() < NEAREST && seen.add(n.violated().key() + "/" + n.family().order())) {
                nearest.add(n);
            }
        }
        return new Diagnosis(sampled, sorted, nearest, LimitConflict.of(req), StrengthBound.of(space));
    }

    private static List<Long> spread(long lo, long hi) {
        List<Long> out = new ArrayList<>();
        if (hi < lo) {
            return out;
        }
        long n = Math.min(SAMPLES, hi - lo + 1);
        for (int i = 0; i < n; i++) {
            long v = n == 1 ? lo : lo + Math.round((double) (hi - lo) * i / (n - 1));
            if (out.isEmpty() || out.get(out.size() - 1) != v) {
                out.add(v);
            }
        }
        return out;
    }

    private static List<Spring> springsFor(DesignSpace space, Family f, double dm, double na) {
        Requirement req = space.requirement();
        Grid g = space.grid();
        double d = f.wireDiameter();
        double ls = f.ends().solidLength(d, f.ends().totalCoils(na));
        Spring probe = new Spring(f.material(), f.ends(), d, dm, na, g.length(space.firstFreeLengthIndex(ls)));
        double k = probe.rate();
        double work = req.job() instanceof Arrest a
                ? ArrestBalance.maxCompression(k, a.mass(), a.contactSpeed(), a.pushForce(), 0)
                : LaunchBalance.cockedCompression(k, ((Launch) req.job()).height(), req.job().mass(),
                        probe.activeMass(), ((Launch) req.job()).angle(), ((Launch) req.job()).efficiency());
        double l0 = g.length(Math.max(space.firstFreeLengthIndex(ls),
                g.lengthIndexAtLeast(ls + (1 + req.spring().clashAllowance()) * work)));
        List<Spring> out = new ArrayList<>();
        out.add(probe.withFreeLength(l0));
        if (req.job() instanceof Arrest && req.envelope().pocketLength().isPresent()) {
            double pocket = req.envelope().pocketLength().getAsDouble();
            if (pocket > ls && Math.abs(pocket - l0) > g.step() / 2) {
                out.add(probe.withFreeLength(g.length(g.lengthIndexAtLeast(pocket))));
            }
        }
        return out;
    }
}
