package dev.coilwise.catalog;

import dev.coilwise.mechanics.DesignEvaluator;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.mechanics.Margin;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.SpringOptions;
import java.util.ArrayList;
import java.util.List;

/**
 * Evaluates stock parts against a requirement with {@link DesignEvaluator}, the same limits as custom designs. A
 * stock part's geometry is fixed, so what a search would choose now follows from it: for an arrest with a pocket the
 * preload is the rate times (free length − pocket length); for a launch the cocked compression is whatever the energy
 * balance needs to reach the height. On top of the design limits, the supplier's stated maximum deflection and load,
 * when given, are hard limits on the total deflection and peak force.
 *
 * <p>Pure and thread-safe. Each part costs one {@link DesignEvaluator#evaluate} call; docs/performance.md records the
 * throughput.
 */
public final class StockEvaluator {
    private StockEvaluator() {
    }

    /** Evaluates every part, in catalogue order. */
    public static List<StockEvaluation> evaluate(List<StockPart> parts, Requirement req) {
        List<StockEvaluation> out = new ArrayList<>(parts.size());
        for (StockPart p : parts) {
            out.add(evaluate(p, req));
        }
        return out;
    }

    /** Evaluates one part. */
    public static StockEvaluation evaluate(StockPart part, Requirement req) {
        Evaluation e = DesignEvaluator.evaluate(part.spring(), req);
        List<Margin> stock = new ArrayList<>(2);
        part.maxDeflection().ifPresent(v -> stock.add(
                Margin.atMost("stock_max_deflection", e.totalDeflection(), v, "m", true)));
        part.maxLoad().ifPresent(v -> stock.add(Margin.atMost("stock_max_load", e.peakForce(), v, "N", true)));
        return new StockEvaluation(part, e, stock, inDesignSpace(part, req.spring()));
    }

    /** The requirement's feasible parts, in catalogue order. */
    public static List<StockEvaluation> feasible(List<StockPart> parts, Requirement req) {
        return evaluate(parts, req).stream().filter(StockEvaluation::feasible).toList();
    }

    private static boolean inDesignSpace(StockPart p, SpringOptions opt) {
        boolean material = opt.materials().isEmpty() ? p.spring().material().steel()
                : opt.materials().contains(p.spring().material().key());
        return material && opt.ends().contains(p.spring().ends());
    }
}
