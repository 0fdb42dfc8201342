package dev.coilwise.search;

import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.Requirement;
import dev.coilwise.requirement.RequirementReader;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Stream;

/**
 * The search benchmark's per-requirement report (run by {@code mvn -Pbenchmark verify}, see docs/performance.md):
 * over every file of {@code requirements/} and {@value #GENERATED} generated requirements
 * ({@link RequirementGenerator}, seed {@value #SEED}), it times the pruned search on the full grid, compares it with
 * brute force on the reduced space {@link ReducedSpace#BENCHMARK} (time, candidates, identical top ten), and runs the
 * CMA-ES baseline ({@link OptimiserBaseline}) on the full requirement. Writes {@code search-report.csv} and
 * {@code search-summary.md} to the output folder and prints the summary.
 *
 * <p>Arguments: output folder (default target/benchmark), requirements folder (default requirements), number of
 * generated requirements (default {@value #GENERATED}).
 */
public final class SearchBenchmarkReport {
    static final long SEED = 20_251_202L;
    static final int GENERATED = 200;
    /** Timed runs of the pruned search on the full grid per requirement (after {@value #WARM} untimed ones). */
    static final int RUNS = 5;
    static final int WARM = 2;

    private SearchBenchmarkReport() {
    }

    record Named(String name, Requirement requirement) {
    }

    record Row(String name, String job, String units, String by, int families, double prunedMs, long prunedEvaluated,
               int feasibleFamilies, int reducedFamilies, double bruteMs, long bruteEvaluated, double prunedReducedMs,
               long prunedReducedEvaluated, boolean topTenIdentical, boolean allIdentical, int reducedFeasible,
               double ours, double baseline, double baselineMs) {
    }

    public static void main(String[] args) throws IOException {
        Path out = Path.of(args.length > 0 ? args[0] : "target/benchmark");
        Path dir = Path.of(args.length > 1 ? args[1] : "requirements");
        int generated = args.length > 2 ? Integer.parseInt(args[2]) : GENERATED;
        MaterialTable table = MaterialTable.loadDefault();
        List<Named> set = new ArrayList<>();
        if (Files.isDirectory(dir)) {
            try (Stream<Path> files = Files.list(dir)) {
                for (Path p : files.filter(f -> f.toString().endsWith(".yaml")).sorted().toList()) {
                    set.add(new Named(p.getFileName().toString(), new RequirementReader(table).read(p)));
                }
            }
        } else {
            System.out.println("no folder " + dir + "; generated requirements only");
        }
        int files = set.size();
        RequirementGenerator.generate(SEED, generated).forEach(r -> set.add(new Named(r.title(), r)));
        for (int w = 0; w < WARM; w++) {
            set.stream().limit(30).forEach(n -> new PrunedSearch().run(DesignSpace.of(n.requirement(), table)));
        }
        List<Row> rows = new ArrayList<>();
        OptimiserBaseline baseline = new OptimiserBaseline(SEED);
        for (Named n : set) {
            rows.add(measure(n, table, baseline));
            Row r = rows.get(rows.size() - 1);
            System.out.printf(Locale.ROOT, "%-58s pruned %7.1f ms %8d | reduced: brute %9d in %8.0f ms, pruned %6d, top10 %s | cma %s%n",
                    r.name(), r.prunedMs(), r.prunedEvaluated(), r.bruteEvaluated(), r.bruteMs(),
                    r.prunedReducedEvaluated(), r.topTenIdentical() ? "same" : "DIFFERENT", ratio(r));
        }
        Files.createDirectories(out);
        Files.writeString(out.resolve("search-report.csv"), csv(rows));
        String summary = BenchmarkSummary.markdown(rows, files, generated, SEED);
        Files.writeString(out.resolve("search-summary.md"), summary);
        System.out.println();
        System.out.print(summary);
    }

    private static Row measure(Named n, MaterialTable table, OptimiserBaseline baseline) {
        Requirement req = n.requirement();
        DesignSpace full = DesignSpace.of(req, table);
        PrunedSearch pruned = new PrunedSearch();
        SearchResult fullResult = null;
        double[] times = new double[RUNS];
        for (int i = -WARM; i < RUNS; i++) {
            long t0 = System.nanoTime();
            fullResult = pruned.run(full);
            if (i >= 0) {
                times[i] = (System.nanoTime() - t0) / 1e6;
            }
        }
        Candidate winner = fullResult.best().isEmpty() ? null : fullResult.best().get(0);
        DesignSpace reduced = ReducedSpace.BENCHMARK.of(req, table, winner);
        long t0 = System.nanoTime();
        SearchResult brute = new BruteForceSearch().run(reduced);
        double bruteMs = (System.nanoTime() - t0) / 1e6;
        SearchResult prunedReduced = null;
        double[] reducedTimes = new double[3];
        for (int i = 0; i < 3; i++) {
            long t1 = System.nanoTime();
            prunedReduced = pruned.run(reduced);
            reducedTimes[i] = (System.nanoTime() - t1) / 1e6;
        }
        long t2 = System.nanoTime();
        Optional<Candidate> cma = baseline.solve(full);
        double cmaMs = (System.nanoTime() - t2) / 1e6;
        double ours = winner == null ? Double.NaN : Objective.value(req.ranking().by(), winner.evaluation());
        double theirs = cma.map(c -> Objective.value(req.ranking().by(), c.evaluation())).orElse(Double.NaN);
        return new Row(n.name(), req.job().key(), req.units().name(), req.ranking().by().key(), full.families().size(),
                median(times), fullResult.evaluated(), fullResult.best().size(), reduced.families().size(), bruteMs,
                brute.evaluated(), median(reducedTimes), prunedReduced.evaluated(),
                prunedReduced.top(10).equals(brute.top(10)), prunedReduced.best().equals(brute.best()),
                brute.best().size(), ours, theirs, cmaMs);
    }

    static double median(double[] v) {
        double[] s = v.clone();
        Arrays.sort(s);
        return s.length % 2 == 1 ? s[s.length / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
    }

    static String ratio(Row r) {
        if (Double.isNaN(r.ours())) {
            return Double.isNaN(r.baseline()) ? "both none" : "OURS NONE, baseline " + r.baseline();
        }
        return Double.isNaN(r.baseline()) ? "baseline none" : String.format(Locale.ROOT, "%.4f", r.baseline() / r.ours());
    }

    private static String csv(List<Row> rows) {
        StringBuilder sb = new StringBuilder("name,job,units,ranked_by,families,pruned_full_ms_median,pruned_full_evaluated,"
                + "feasible_families,reduced_families,brute_reduced_ms,brute_reduced_evaluated,pruned_reduced_ms_median,"
                + "pruned_reduced_evaluated,evaluation_ratio,top10_identical,all_families_identical,reduced_feasible_families,"
                + "ours_criterion_SI,cmaes_criterion_SI,cmaes_over_ours,cmaes_ms\n");
        for (Row r : rows) {
            sb.append(String.format(Locale.ROOT, "\"%s\",%s,%s,%s,%d,%.3f,%d,%d,%d,%.1f,%d,%.3f,%d,%.1f,%s,%s,%d,%s,%s,%s,%.0f%n",
                    r.name(), r.job(), r.units(), r.by(), r.families(), r.prunedMs(), r.prunedEvaluated(),
                    r.feasibleFamilies(), r.reducedFamilies(), r.bruteMs(), r.bruteEvaluated(), r.prunedReducedMs(),
                    r.prunedReducedEvaluated(), (double) r.bruteEvaluated() / Math.max(1, r.prunedReducedEvaluated()),
                    r.topTenIdentical(), r.allIdentical(), r.reducedFeasible(), num(r.ours()), num(r.baseline()),
                    Double.isNaN(r.ours()) || Double.isNaN(r.baseline()) ? "" : num(r.baseline() / r.ours()),
                    r.baselineMs()));
        }
        return sb.toString();
    }

    private static String num(double v) {
        return Double.isNaN(v) ? "" : String.format(Locale.ROOT, "%.6g", v);
    }
}
