package dev.coilwise.search;

import dev.coilwise.mechanics.Evaluation;

/**
 * One design of the shortlist.
 *
 * @param rank       1-based rank
 * @param candidate  the design and its family
 */
public record ShortlistEntry(int rank, Candidate candidate) {
    public Evaluation evaluation() {
        return candidate.evaluation();
    }
}
