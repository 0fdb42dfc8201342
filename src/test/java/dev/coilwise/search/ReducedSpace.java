package dev.coilwise.search;

import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.SpringOptions;
import java.util.List;

/**
 * A design space small enough for {@link BruteForceSearch}, cut out of a requirement's full space around an anchor
 * design (the full-grid winner of the pruned search, or the middle of the space when nothing is feasible):
 * <ul>
 *   <li>wire diameters: the anchor's preferred wire and {@code wiresEachSide} neighbours on each side in the
 *       requirement's series (every material and end type of the requirement is kept);</li>
 *   <li>the grid step of mean diameter and free length made the multiple of the requirement's step nearest to
 *       {@code step} (m): 0.5 mm is 5 × 0.1 mm for SI requirements and 20 × 0.001 in = 0.508 mm for US ones;</li>
 *   <li>the requirement's spring index range cut to the anchor's index ± {@code indexHalfWidth}, and its active-coil
 *       range to the anchor's count ± {@code coilsHalfWidth} (so the cut requirement is itself a valid one, and
 *       designs outside the cut are infeasible for both searches alike).</li>
 * </ul>
 * Pruned and brute-force searches are then compared on this same space.
 */
public record ReducedSpace(int wiresEachSide, double step, double indexHalfWidth, double coilsHalfWidth) {

    /** The cut used by the benchmark (see docs/performance.md). */
    public static final ReducedSpace BENCHMARK = new ReducedSpace(1, 0.5e-3, 1.0, 2.0);

    /** A smaller cut for unit tests. */
    public static final ReducedSpace TEST = new ReducedSpace(1, 0.8e-3, 0.75, 1.5);

    /** The reduced space of {@code req} around {@code anchor} (null: the middle of the full space). */
    public DesignSpace of(Requirement req, MaterialTable table, Candidate anchor) {
        DesignSpace full = DesignSpace.of(req, table);
        List<Double> wires = full.wireDiameters();
        SpringOptions o = req.spring();
        double d = anchor != null ? anchor.family().wireDiameter() : wires.get(wires.size() / 2);
        double c = anchor != null ? anchor.evaluation().spring().index() : (o.indexMin() + o.indexMax()) / 2;
        double na = anchor != null ? anchor.evaluation().spring().activeCoils() : (o.coilsMin() + o.coilsMax()) / 2;
        int at = wires.indexOf(d);
        List<Double> kept = wires.subList(Math.max(0, at - wiresEachSide), Math.min(wires.size(), at + wiresEachSide + 1));
        double cLo = Math.max(o.indexMin(), c - indexHalfWidth);
        double cHi = Math.min(o.indexMax(), c + indexHalfWidth);
        double nLo = Math.max(o.coilsMin(), na - coilsHalfWidth);
        double nHi = Math.min(o.coilsMax(), na + coilsHalfWidth);
        SpringOptions cut = new SpringOptions(o.materials(), o.ends(), cLo, cHi, nLo, nHi, o.clashAllowance(),
                o.solidSafe(), o.setRemoved(), o.seating(), o.wireSeries(), o.cycles(), o.shotPeened(),
                o.fatigueMargin(), o.toleranceGrade());
        Requirement r = new Requirement(req.title(), req.job(), req.limits(), req.envelope(), cut, req.ranking(),
                req.units(), req.stock());
        List<Family> fams = full.families().stream().filter(f -> kept.contains(f.wireDiameter())).toList();
        double factor = Math.max(1, Math.round(step / full.grid().step()));
        return new DesignSpace(r, new Grid(full.grid().step() * factor), full.materials(), full.ends(), kept, fams);
    }
}
