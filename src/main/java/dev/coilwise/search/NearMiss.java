package dev.coilwise.search;

import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.mechanics.Margin;

/**
 * A design that fails exactly one hard limit, and that limit: relaxing it by the margin's shortfall would admit it.
 *
 * @param family     the design's family
 * @param evaluation its full evaluation
 * @param violated   the one limit it fails
 */
public record NearMiss(Family family, Evaluation evaluation, Margin violated) {
}
