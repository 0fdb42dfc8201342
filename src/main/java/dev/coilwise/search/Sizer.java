package dev.coilwise.search;

import dev.coilwise.materials.MaterialTable;
import dev.coilwise.mechanics.Margin;
import dev.coilwise.model.RankBy;
import dev.coilwise.model.Requirement;
import dev.coilwise.scatter.MonteCarlo;
import dev.coilwise.scatter.ScatterSettings;
import dev.coilwise.scatter.ScatterSummary;
import dev.coilwise.scatter.ToleranceSource;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Sizes a requirement: search, shortlist, manufacturing scatter, and a diagnosis when nothing is feasible.
 *
 * <p>Robustness: with {@code ranking.by: robustness} or {@code ranking.min_probability}, the Monte Carlo runs on the
 * leading {@value SizingOptions#ROBUSTNESS_POOL}× shortlist-length designs of the search (robustness pre-ranks by
 * mass); designs below the minimum probability leave, and robustness ranks the rest by the probability that every
 * limit holds (ties keep the search order).
 */
public final class Sizer {
    private final MaterialTable materials;
    private final SpringSearch search;
    private final SizingOptions options;

    public Sizer(MaterialTable materials) {
        this(materials, new PrunedSearch(), SizingOptions.defaults());
    }

    public Sizer(MaterialTable materials, SpringSearch search, SizingOptions options) {
        this.materials = materials;
        this.search = search;
        this.options = options;
    }

    public SizingResult size(Requirement req) {
        DesignSpace space = DesignSpace.of(req, materials);
        SearchResult result = search.run(space);
        int n = req.ranking().shortlist();
        boolean robust = req.ranking().by() == RankBy.ROBUSTNESS || req.ranking().minProbability().isPresent();
        ScatterSettings ss = options.scatter();
        if (robust && ss.samples() == 0) {
            ss = ss.withSamples(ScatterSettings.DEFAULT_SAMPLES);
        }
        List<Candidate> pool = result.top(robust ? SizingOptions.ROBUSTNESS_POOL * n : n);
        List<ShortlistEntry> entries = new ArrayList<>();
        List<ScatterSummary> scatter = ss.samples() > 0 && !pool.isEmpty()
                ? MonteCarlo.summarise(pool.stream().map(c -> c.evaluation().spring()).toList(), req,
                        ToleranceSource.en15800(), ss, options.progress())
                : List.of();
        for (int i = 0; i < pool.size(); i++) {
            entries.add(new ShortlistEntry(i + 1, pool.get(i),
                    scatter.isEmpty() ? Optional.empty() : Optional.of(scatter.get(i))));
        }
        List<String> warnings = new ArrayList<>();
        int before = entries.size();
        if (req.ranking().minProbability().isPresent()) {
            double pMin = req.ranking().minProbability().getAsDouble();
            entries.removeIf(e -> e.scatter().orElseThrow().probabilityOk() < pMin);
            if (entries.size() < before) {
                warnings.add((before - entries.size()) + " of the " + before + " leading designs were dropped: fewer than "
                        + Math.round(pMin * 1000) / 10.0 + " % of springs made to tolerance grade "
                        + req.spring().toleranceGrade() + " would meet every limit (ranking.min_probability)");
            }
        }
        if (req.ranking().by() == RankBy.ROBUSTNESS) {
            entries.sort(Comparator.comparingDouble(e -> -e.scatter().orElseThrow().probabilityOk()));
        }
        List<ShortlistEntry> list = new ArrayList<>();
        for (int i = 0; i < Math.min(n, entries.size()); i++) {
            list.add(entries.get(i).withRank(i + 1));
        }
        for (ShortlistEntry e : list) {
            e.evaluation().margins().stream().filter(m -> !m.hard() && !m.holds()).forEach(m -> warnings.add(
                    "design " + e.rank() + ": " + softWarning(m)));
        }
        Optional<Diagnosis> diagnosis = Optional.empty();
        if (list.isEmpty()) {
            diagnosis = Optional.of(before > 0
                    ? new Diagnosis(before, Map.of("min_probability", (long) before), List.of())
                    : Diagnoser.diagnose(space));
        }
        return new SizingResult(req, result, list, diagnosis, warnings);
    }

    private static String softWarning(Margin m) {
        return switch (m.key()) {
            case "buckling" -> "would buckle unguided at its working deflection; it relies on the bore or rod to guide it";
            case "stress_solid" -> "is over-stressed if compressed solid (solid_safe is off): it must never reach solid";
            default -> m.key() + " limit exceeded by " + Math.round(-m.value() * 100) + " %";
        };
    }
}
