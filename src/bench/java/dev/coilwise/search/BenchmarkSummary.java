package dev.coilwise.search;

import dev.coilwise.search.SearchBenchmarkReport.Row;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.function.ToDoubleFunction;

/** The Markdown summary of a {@link SearchBenchmarkReport} run: the figures docs/performance.md quotes. */
final class BenchmarkSummary {
    private BenchmarkSummary() {
    }

    static String markdown(List<Row> rows, int files, int generated, long seed) {
        StringBuilder sb = new StringBuilder();
        int n = rows.size();
        long feasible = rows.stream().filter(r -> !Double.isNaN(r.ours())).count();
        long reducedFeasible = rows.stream().filter(r -> r.reducedFeasible() > 0).count();
        long same = rows.stream().filter(Row::topTenIdentical).count();
        long allSame = rows.stream().filter(Row::allIdentical).count();
        sb.append(String.format(Locale.ROOT, "Requirements: %d (%d files of requirements/, %d generated with seed %d); "
                + "%d with a feasible design on the full grid, %d on the reduced space.%n%n", n, files, generated, seed,
                feasible, reducedFeasible));
        sb.append("| figure | median | 10th pct | 90th pct | worst |\n|---|---|---|---|---|\n");
        line(sb, "pruned search, full grid, ms", rows, Row::prunedMs, true);
        line(sb, "pruned search, full grid, candidates checked", rows, r -> r.prunedEvaluated(), true);
        line(sb, "brute force, reduced space, ms", rows, Row::bruteMs, true);
        line(sb, "pruned search, reduced space, ms", rows, Row::prunedReducedMs, true);
        line(sb, "brute force / pruned, candidates, reduced space", rows,
                r -> (double) r.bruteEvaluated() / Math.max(1, r.prunedReducedEvaluated()), false);
        line(sb, "brute force / pruned, time, reduced space", rows,
                r -> r.bruteMs() / Math.max(1e-3, r.prunedReducedMs()), false);
        sb.append(String.format(Locale.ROOT, "%nTop ten identical to brute force on the reduced space: %d of %d "
                + "(best of every family identical: %d of %d).%n", same, n, allSame, n));
        long both = rows.stream().filter(r -> !Double.isNaN(r.ours()) && !Double.isNaN(r.baseline())).count();
        long baselineNone = rows.stream().filter(r -> !Double.isNaN(r.ours()) && Double.isNaN(r.baseline())).count();
        long oursNone = rows.stream().filter(r -> Double.isNaN(r.ours()) && !Double.isNaN(r.baseline())).count();
        double[] excess = rows.stream().filter(r -> !Double.isNaN(r.ours()) && !Double.isNaN(r.baseline()))
                .mapToDouble(r -> r.baseline() / r.ours() - 1).sorted().toArray();
        long strictlyOurs = Arrays.stream(excess).filter(x -> x > 1e-9).count();
        long strictlyTheirs = Arrays.stream(excess).filter(x -> x < -1e-9).count();
        sb.append(String.format(Locale.ROOT, "%nCMA-ES baseline (rounded to the grid, checked in full): feasible design "
                + "on %d of the %d requirements where ours has one; none on %d; a design where ours has none: %d.%n",
                both, feasible, baselineNone, oursNone));
        if (excess.length > 0) {
            sb.append(String.format(Locale.ROOT, "Ours strictly better on %d of %d, equal on %d, baseline better on %d. "
                    + "Baseline criterion over ours: median %.4f, 90th pct %.4f, worst %.4f.%n", strictlyOurs,
                    excess.length, excess.length - strictlyOurs - strictlyTheirs, strictlyTheirs,
                    1 + pct(excess, 0.5), 1 + pct(excess, 0.9), 1 + excess[excess.length - 1]));
        }
        return sb.toString();
    }

    private static void line(StringBuilder sb, String what, List<Row> rows, ToDoubleFunction<Row> f, boolean highWorst) {
        double[] v = rows.stream().mapToDouble(f).filter(Double::isFinite).sorted().toArray();
        if (v.length == 0) {
            return;
        }
        double worst = highWorst ? v[v.length - 1] : v[0];
        sb.append(String.format(Locale.ROOT, "| %s | %s | %s | %s | %s |%n", what, fmt(pct(v, 0.5)), fmt(pct(v, 0.1)),
                fmt(pct(v, 0.9)), fmt(worst)));
    }

    private static double pct(double[] sorted, double p) {
        return sorted[Math.min(sorted.length - 1, (int) Math.floor(p * sorted.length))];
    }

    private static String fmt(double v) {
        return Math.abs(v) >= 100 ? String.format(Locale.ROOT, "%.0f", v) : String.format(Locale.ROOT, "%.3g", v);
    }
}
