package dev.coilwise.search;

import java.util.List;
import java.util.Map;

/**
 * Why nothing was feasible: how many sampled candidates each limit removed, and the nearest misses.
 *
 * @param sampled   candidates evaluated for the diagnosis
 * @param removedBy per limit key, how many sampled candidates fail it (a candidate may fail several); sorted by
 *                  count, highest first
 * @param nearest   designs failing a single limit, smallest shortfall first, at most one per limit and family
 * @param conflicts force limits that no spring can meet within the stroke (work-energy bounds, before any search)
 */
public record Diagnosis(long sampled, Map<String, Long> removedBy, List<NearMiss> nearest, List<LimitConflict> conflicts) {
    public Diagnosis {
        removedBy = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(removedBy));
        nearest = List.copyOf(nearest);
        conflicts = List.copyOf(conflicts);
    }

    /** A diagnosis without work-energy conflicts. */
    public Diagnosis(long sampled, Map<String, Long> removedBy, List<NearMiss> nearest) {
        this(sampled, removedBy, nearest, List.of());
    }
}
