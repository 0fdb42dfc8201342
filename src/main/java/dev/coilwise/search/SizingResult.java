package dev.coilwise.search;

import dev.coilwise.model.Requirement;
import java.util.List;
import java.util.Optional;

/**
 * Everything `coilwise size` found for one requirement.
 *
 * @param requirement the requirement sized
 * @param search      the search outcome (all family bests, counts, the space searched)
 * @param shortlist   the ranked designs kept
 * @param diagnosis   present when nothing is feasible
 * @param warnings    notes for the designer, in plain words
 */
public record SizingResult(Requirement requirement, SearchResult search, List<ShortlistEntry> shortlist,
                           Optional<Diagnosis> diagnosis, List<String> warnings) {
    public SizingResult {
        shortlist = List.copyOf(shortlist);
        warnings = List.copyOf(warnings);
    }

    /** A copy with {@code first} placed before the existing warnings. */
    public SizingResult withLeadingWarnings(List<String> first) {
        List<String> all = new java.util.ArrayList<>(first);
        all.addAll(warnings);
        return new SizingResult(requirement, search, shortlist, diagnosis, all);
    }

    public boolean feasible() {
        return !shortlist.isEmpty();
    }
}
