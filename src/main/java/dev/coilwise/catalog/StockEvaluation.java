package dev.coilwise.catalog;

import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.mechanics.Margin;
import java.util.List;
import java.util.stream.Stream;

/**
 * One stock part judged against one requirement.
 *
 * @param part          the part
 * @param evaluation    the mechanics evaluation of the part's (recomputed) spring, same limits as a custom design
 * @param stockMargins  the supplier's own ratings as hard margins: {@code stock_max_deflection}, {@code stock_max_load}
 *                      (empty when the catalogue states neither)
 * @param inDesignSpace whether the part's material and end type are among those the requirement allows
 *                      ({@code spring.materials} when listed, {@code spring.ends})
 */
public record StockEvaluation(StockPart part, Evaluation evaluation, List<Margin> stockMargins, boolean inDesignSpace) {
    public StockEvaluation {
        stockMargins = List.copyOf(stockMargins);
    }

    /** Every hard margin of the evaluation and of the supplier ratings holds. */
    public boolean feasible() {
        return evaluation.feasible() && stockMargins.stream().filter(Margin::hard).allMatch(Margin::holds);
    }

    /** The evaluation's margins followed by the supplier-rating margins. */
    public List<Margin> allMargins() {
        return Stream.concat(evaluation.margins().stream(), stockMargins.stream()).toList();
    }
}
