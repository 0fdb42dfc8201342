package dev.coilwise.search;

import dev.coilwise.mechanics.Evaluation;

/** A feasible design found by a search, with the family it belongs to. */
public record Candidate(Family family, Evaluation evaluation) {
}
