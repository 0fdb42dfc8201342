package dev.coilwise.search;

import dev.coilwise.catalog.StockEvaluation;
import dev.coilwise.catalog.StockEvaluator;
import dev.coilwise.catalog.StockPart;
import dev.coilwise.dynamics.ApexBand;
import dev.coilwise.dynamics.DynamicsFlags;
import dev.coilwise.dynamics.LimitBreach;
import dev.coilwise.dynamics.SimulatedLimits;
import dev.coilwise.dynamics.SimulationOptions;
import dev.coilwise.dynamics.SimulationResult;
import dev.coilwise.dynamics.SimulationSummary;
import dev.coilwise.dynamics.Simulator;
import dev.coilwise.materials.MaterialTable;
import dev.coilwise.mechanics.Margin;
import dev.coilwise.model.Prefer;
import dev.coilwise.model.RankBy;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.UnitSystem;
import dev.coilwise.scatter.MonteCarlo;
import dev.coilwise.scatter.ScatterSettings;
import dev.coilwise.scatter.ScatterSummary;
import dev.coilwise.scatter.ToleranceSource;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Sizes a requirement: search, stock parts, shortlist, manufacturing scatter, time-domain simulation, and a
 * diagnosis when nothing is feasible. Pure: stock catalogues are read by the caller and passed in.
 *
 * <p>Order of work: the search gives the best custom design of every family; feasible stock parts (within the
 * requirement's materials and end types) join them, ordered by {@code ranking.prefer}. The leading designs — the
 * shortlist length, or {@value SizingOptions#POOL} times it when a later step may drop designs — then go through the
 * Monte Carlo ({@code ranking.min_probability} drops designs below it; {@code ranking.by: robustness} re-orders by the
 * probability that every limit holds, ties keeping the search order) and the simulation ({@code ranking.dynamics:
 * strict} drops designs whose simulated figures break a hard limit, see {@link SimulatedLimits}; flags are warnings
 * either way). The first shortlist-length designs left are kept.
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
        return size(req, List.of());
    }

    /** Sizes {@code req}, offering the given stock parts beside custom designs. */
    public SizingResult size(Requirement req, List<StockPart> stock) {
        DesignSpace space = DesignSpace.of(req, materials);
        SearchResult result = search.run(space);
        int n = req.ranking().shortlist();
        List<Candidate> ordered = merge(result, stockCandidates(stock, req, space.families().size()), req);
        boolean robust = req.ranking().by() == RankBy.ROBUSTNESS || req.ranking().minProbability().isPresent();
        boolean strict = req.ranking().dynamicsStrict();
        List<Candidate> pool = ordered.subList(0, Math.min(ordered.size(), robust || strict ? SizingOptions.POOL * n : n));
        List<String> warnings = new ArrayList<>();
        Map<String, Long> removed = new LinkedHashMap<>();

        Optional<ScatterSettings> ss = options.scatter().or(() -> robust ? Optional.of(ScatterSettings.defaults())
                : Optional.empty());
        List<ScatterSummary> scatter = ss.isPresent() && !pool.isEmpty()
                ? MonteCarlo.summarise(pool.stream().map(c -> c.evaluation().spring()).toList(), req,
                        ToleranceSource.en15800(), ss.get(), options.progress())
                : List.of();
        List<ShortlistEntry> entries = new ArrayList<>();
        for (int i = 0; i < pool.size(); i++) {
            entries.add(new ShortlistEntry(i + 1, pool.get(i),
                    scatter.isEmpty() ? Optional.empty() : Optional.of(scatter.get(i))));
        }
        if (req.ranking().minProbability().isPresent()) {
            double pMin = req.ranking().minProbability().getAsDouble();
            int before = entries.size();
            entries.removeIf(e -> e.scatter().orElseThrow().probabilityOk() < pMin);
            if (entries.size() < before) {
                removed.put("min_probability", (long) (before - entries.size()));
                warnings.add((before - entries.size()) + " of the " + before + " leading designs left the shortlist:"
                        + " fewer than " + Math.round(pMin * 1000) / 10.0 + " % of springs made to EN 15800 grade "
                        + req.spring().toleranceGrade() + " would meet every limit (ranking.min_probability)");
            }
        }
        if (req.ranking().by() == RankBy.ROBUSTNESS) {
            entries.sort(Comparator.comparingDouble(e -> -e.scatter().orElseThrow().probabilityOk()));
        }
        Optional<SimulationOptions> sim = options.simulation().or(() -> strict ? Optional.of(SimulationOptions.defaults())
                : Optional.empty());
        ScatterSettings band = ss.orElse(ScatterSettings.defaults());
        Strictness rule = new Strictness(strict, new ApexBand(band.heightShortfall(), band.heightOvershoot()));
        List<ShortlistEntry> list = sim.isPresent() ? simulate(entries, req, sim.get(), n, rule, removed, warnings)
                : entries.subList(0, Math.min(n, entries.size()));
        List<ShortlistEntry> ranked = new ArrayList<>();
        for (int i = 0; i < list.size(); i++) {
            ranked.add(list.get(i).withRank(i + 1));
        }
        for (ShortlistEntry e : ranked) {
            e.evaluation().margins().stream().filter(m -> !m.hard() && !m.holds()).forEach(m -> warnings.add(
                    "design " + e.rank() + ": " + softWarning(m)));
            e.simulation().ifPresent(s -> DynamicsFlags.warnings(s, e.evaluation(), req.job(), req.units()).stream()
                    .filter(f -> !f.contains(DEVIATION_FLAG))
                    .forEach(f -> warnings.add("design " + e.rank() + " (simulation): " + f)));
        }
        deviationSummary(ranked).ifPresent(warnings::add);
        Optional<Diagnosis> diagnosis = Optional.empty();
        if (ranked.isEmpty()) {
            diagnosis = Optional.of(removed.isEmpty() ? Diagnoser.diagnose(space)
                    : new Diagnosis(pool.size(), removed, List.of()));
        }
        return new SizingResult(req, result, ranked, diagnosis, warnings);
    }

    /** Whether strict dynamics applies, and the launch band it holds the simulated apex to. */
    private record Strictness(boolean on, ApexBand band) {
    }

    /**
     * Simulates designs in order; under strict dynamics drops those whose simulated figures break a hard limit until
     * {@code n} are kept.
     */
    private static List<ShortlistEntry> simulate(List<ShortlistEntry> entries, Requirement req, SimulationOptions opt,
                                                 int n, Strictness strict, Map<String, Long> removed,
                                                 List<String> warnings) {
        List<ShortlistEntry> kept = new ArrayList<>();
        int next = 0;
        long dropped = 0;
        while (kept.size() < n && next < entries.size()) {
            List<ShortlistEntry> batch = entries.subList(next, Math.min(entries.size(), next + n - kept.size()));
            next += batch.size();
            List<SimulationResult> sims = batch.parallelStream()
                    .map(e -> Simulator.simulate(e.evaluation().spring(), req, e.evaluation(), opt)).toList();
            for (int i = 0; i < batch.size(); i++) {
                SimulationSummary summary = sims.get(i).summary();
                List<LimitBreach> breaches = strict.on()
                        ? SimulatedLimits.breaches(summary, batch.get(i).evaluation(), req, strict.band()) : List.of();
                if (!breaches.isEmpty()) {
                    dropped++;
                    warnings.add("left the shortlist under ranking.dynamics: strict: "
                            + describe(batch.get(i).candidate(), req.units()) + ": "
                            + String.join("; ", breaches.stream().map(LimitBreach::words).toList()));
                } else {
                    kept.add(batch.get(i).withSimulation(sims.get(i)));
                }
            }
        }
        if (dropped > 0) {
            removed.put("dynamics", dropped);
        }
        return kept;
    }

    /** Words of the simulation's flag for a figure more than 5 % from the energy balance. */
    private static final String DEVIATION_FLAG = "differs from the energy balance";

    /** One line for every design whose simulated figures differ from the balance by more than 5 %. */
    private static Optional<String> deviationSummary(List<ShortlistEntry> ranked) {
        List<ShortlistEntry> off = ranked.stream().filter(e -> e.simulation().map(s -> s.flags().stream()
                .anyMatch(f -> f.contains(DEVIATION_FLAG))).orElse(false)).toList();
        if (off.isEmpty()) {
            return Optional.empty();
        }
        double lo = off.stream().mapToDouble(e -> e.simulation().get().deviationPct()).min().orElse(0);
        double hi = off.stream().mapToDouble(e -> e.simulation().get().deviationPct()).max().orElse(0);
        String which = off.size() == ranked.size() ? "every design" : "design" + (off.size() > 1 ? "s " : " ")
                + String.join(", ", off.stream().map(e -> String.valueOf(e.rank())).toList());
        boolean arrest = ranked.get(0).evaluation().job().equals("arrest");
        return Optional.of(String.format(java.util.Locale.ROOT, "simulation: %s differs from the energy balance by"
                + " %.1f to %.1f %% (%s); the simulation block of each design in shortlist.json has the figures",
                which, lo, hi, arrest ? "an impact sends a stress wave along the coils, so the struck end sees more"
                        + " force than the quasi-static balance" : "the spring spends energy moving its own coils"));
    }

    /** One inch, m (exact; NIST SP 811, 2008 ed., Appendix B). */
    private static final double INCH = 0.0254;

    /** The design in a few words: stock part number, or material, ends, d, D and Na in the requirement's units. */
    static String describe(Candidate c, UnitSystem units) {
        var s = c.evaluation().spring();
        String geometry = units == UnitSystem.US
                ? String.format(java.util.Locale.ROOT, " d %.4f in D %.3f in Na %.2f", s.wireDiameter() / INCH,
                        s.meanDiameter() / INCH, s.activeCoils())
                : String.format(java.util.Locale.ROOT, " d %.2f mm D %.1f mm Na %.2f", s.wireDiameter() * 1e3,
                        s.meanDiameter() * 1e3, s.activeCoils());
        return c.stock().map(p -> "stock part " + p.partNumber()).orElse(s.material().key() + " " + s.ends().key()
                + geometry);
    }

    private static List<Candidate> stockCandidates(List<StockPart> stock, Requirement req, int firstOrder) {
        List<Candidate> out = new ArrayList<>();
        int order = firstOrder;
        for (StockEvaluation se : StockEvaluator.evaluate(stock, req)) {
            int o = order++;
            if (se.feasible() && se.inDesignSpace()) {
                var s = se.part().spring();
                out.add(new Candidate(new Family(o, s.material(), s.ends(), s.wireDiameter()), se.evaluation(),
                        Optional.of(se.part())));
            }
        }
        return out;
    }

    private static List<Candidate> merge(SearchResult result, List<Candidate> stock, Requirement req) {
        Comparator<Candidate> byRank = Objective.comparator(req.ranking().by());
        Prefer prefer = req.ranking().prefer();
        Comparator<Candidate> order = switch (prefer) {
            case STOCK -> Comparator.comparing((Candidate c) -> !c.isStock()).thenComparing(byRank);
            case CUSTOM -> Comparator.comparing(Candidate::isStock).thenComparing(byRank);
            case NONE -> byRank;
        };
        List<Candidate> all = new ArrayList<>(result.best());
        all.addAll(stock);
        all.sort(order);
        return all;
    }

    private static String softWarning(Margin m) {
        return switch (m.key()) {
            case "buckling" -> "would buckle unguided at its working deflection; it relies on the bore or rod to guide it";
            case "stress_solid" -> "is over-stressed if compressed solid (solid_safe is off): it must never reach solid";
            default -> m.key() + " limit exceeded by " + Math.round(-m.value() * 100) + " %";
        };
    }
}
