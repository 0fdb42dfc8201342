package dev.coilwise.search;

import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Why nothing was feasible: how many sampled candidates each limit removed, and the nearest misses.
 *
 * @param sampled   candidates evaluated for the diagnosis
 * @param removedBy per limit key, how many sampled candidates fail it (a candidate may fail several); sorted by
 *                  count, highest first
 * @param nearest   designs failing a single limit, smallest shortfall first, at most one per limit and family
 * @param conflicts force limits that no spring can meet within the stroke (work-energy bounds, before any search)
 * @param strength  the least force the job needs within the stroke against the strongest spring of the design space
 *                  (work-energy balance and wire strength, before any search); empty when the job needs no force
 */
public record Diagnosis(long sampled, Map<String, Long> removedBy, List<NearMiss> nearest, List<LimitConflict> conflicts,
                        Optional<StrengthBound> strength) {
    public Diagnosis {
        removedBy = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(removedBy));
        nearest = List.copyOf(nearest);
        conflicts = List.copyOf(conflicts);
        java.util.Objects.requireNonNull(strength);
    }

    /** A diagnosis without work-energy bounds. */
    public Diagnosis(long sampled, Map<String, Long> removedBy, List<NearMiss> nearest) {
        this(sampled, removedBy, nearest, List.of(), Optional.empty());
    }
}
