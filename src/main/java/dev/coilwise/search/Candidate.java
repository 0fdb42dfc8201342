package dev.coilwise.search;

import dev.coilwise.catalog.StockPart;
import dev.coilwise.mechanics.Evaluation;
import java.util.Optional;

/**
 * A feasible design: a custom design found by a search (with its family), or a stock part from a catalogue.
 *
 * @param family     the design's family; for a stock part, a family of its own ordered after every searched one
 * @param evaluation its full evaluation
 * @param stock      the catalogue part, for a stock design
 */
public record Candidate(Family family, Evaluation evaluation, Optional<StockPart> stock) {
    public Candidate(Family family, Evaluation evaluation) {
        this(family, evaluation, Optional.empty());
    }

    public boolean isStock() {
        return stock.isPresent();
    }
}
