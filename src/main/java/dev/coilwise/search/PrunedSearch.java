package dev.coilwise.search;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.atomic.DoubleAccumulator;

/**
 * The default search: the same answer as {@link BruteForceSearch} over the same grid, visiting a small part of it.
 *
 * <p>Per family (material, ends, wire): the surge limit depends only on the family, so it is checked once, and the
 * guide limits bound the mean diameter. Per mean diameter: the peak force is capped by the peak-force and
 * deceleration limits, by the allowable stress and, when the stress at solid is a hard limit, by the allowable
 * stress over 1 + ξ (coil bind keeps L0 − Ls ≥ (1 + ξ) × the total deflection, and k × the total deflection is the
 * peak force); {@link RateBounds} turn that cap and the stroke into a window of active coils, and
 * {@link CriterionBound} gives a lower bound of the ranking criterion over the window. Mean diameters are visited
 * in order of that bound, and the family ends when the bound passes its incumbent. Per active-coil count (in the
 * order in which the criterion's bound rises: ascending, or from the softest spring for the peak force): the count
 * is skipped once its bound passes the incumbent, and when the criterion never falls as coils are added the first
 * feasible count ends the diameter. Per cell: without a pocket the working deflection does not depend on the free
 * length and every limit other than coil bind only worsens as the spring gets longer, so the one free length to try
 * is the shortest the coil-bind rule admits; with a pocket the free lengths are those in the closed-form
 * {@link PreloadWindow}, tried from the shortest (or, ranked by peak force, outwards from the preload that equals
 * the push, while the peak force can still beat the incumbent).
 *
 * <p>All bounds are widened by one grid step (and comparisons with the incumbent by a relative
 * {@value FamilyScan#TIE_SLACK}), so they only skip work and never decide feasibility: every candidate kept is
 * checked with {@link dev.coilwise.mechanics.HardLimits}, which answers exactly as the full evaluation, and the ones
 * that pass are evaluated in full with {@link dev.coilwise.mechanics.DesignEvaluator}. Families run in parallel; each
 * family is searched by one thread in a fixed order, so results and counts are the same on any number of threads.
 * {@link SearchResult#evaluated()} counts every candidate checked.
 */
public final class PrunedSearch implements SpringSearch {

    @Override
    public SearchResult run(DesignSpace space) {
        List<FamilyBest> done = space.families().parallelStream().map(f -> FamilyScan.search(space, f)).toList();
        List<Candidate> best = new ArrayList<>(done.stream().map(FamilyBest::best).filter(Objects::nonNull).toList());
        best.sort(Objective.comparator(space.requirement().ranking().by()));
        long evaluated = done.stream().mapToLong(a -> a.evaluated).sum();
        long feasible = done.stream().mapToLong(a -> a.feasible).sum();
        return new SearchResult(space, best, evaluated, feasible);
    }

    /**
     * The single best design of the space, or empty when none is feasible: the same design as the first of
     * {@link #run}, found faster because families also skip cells that cannot beat the best design any family has
     * found so far. Only the design is returned, since the work done then depends on thread timing.
     */
    public Optional<Candidate> best(DesignSpace space) {
        DoubleAccumulator leader = new DoubleAccumulator(Math::min, Double.POSITIVE_INFINITY);
        return space.families().parallelStream().map(f -> FamilyScan.search(space, f, leader).best())
                .filter(Objects::nonNull).min(Objective.comparator(space.requirement().ranking().by()));
    }
}
