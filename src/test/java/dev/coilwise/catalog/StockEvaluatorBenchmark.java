package dev.coilwise.catalog;

import dev.coilwise.catalog.CatalogGenerator.Units;
import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.Requirement;
import java.io.StringReader;
import java.io.StringWriter;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.function.Supplier;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * Prints import and evaluation times of a 20,000-part catalogue; asserts nothing about time (figures go to
 * docs/performance.md). Run: {@code mvn -q -B test -Dtest=StockEvaluatorBenchmark -Dgroups=benchmark -DexcludedGroups=}
 */
@Tag("benchmark")
class StockEvaluatorBenchmark {
    private static final int PARTS = 20_000;
    private static final int WARMUP = 10;
    private static final int RUNS = 20;

    @Test
    void twentyThousandParts() throws Exception {
        MaterialTable table = MaterialTable.loadDefault();
        StringWriter csv = new StringWriter();
        CatalogGenerator.write(CatalogGenerator.generate(table, Units.METRIC, PARTS, 1), Units.METRIC, "demo data", csv);
        String text = csv.toString();
        CatalogReader reader = new CatalogReader(table);

        double[] importMs = time(() -> reader.read(new StringReader(text), "bench.csv", null).parts().size());
        List<StockPart> parts = reader.read(new StringReader(text), "bench.csv", null).parts();
        Requirement arrest = Requirements.arrest(2.0, 1.5, 0.040, OptionalDouble.of(0.050));
        Requirement launch = Requirements.launch(0.05, 2.0, 0.050);
        Supplier<Integer> arrestRun = () -> (int) StockEvaluator.evaluate(parts, arrest).stream()
                .filter(StockEvaluation::feasible).count();
        Supplier<Integer> launchRun = () -> (int) StockEvaluator.evaluate(parts, launch).stream()
                .filter(StockEvaluation::feasible).count();
        time(launchRun); // warm both paths of the evaluator before timing either
        double[] arrestMs = time(arrestRun);
        double[] launchMs = time(launchRun);

        System.out.printf(Locale.ROOT, "stock catalogue benchmark: %d parts, %d warm-up + %d timed runs, %s, %d cpus,"
                + " load average %.1f%n", parts.size(), WARMUP, RUNS, System.getProperty("java.vm.version"),
                Runtime.getRuntime().availableProcessors(),
                java.lang.management.ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage());
        report("import (parse + recompute)", importMs);
        report("evaluate, arrest with pocket", arrestMs);
        report("evaluate, launch", launchMs);
        System.out.printf(Locale.ROOT, "feasible: arrest %d, launch %d%n",
                StockEvaluator.feasible(parts, arrest).size(), StockEvaluator.feasible(parts, launch).size());
    }

    private static double[] time(Supplier<Integer> work) {
        int sink = 0;
        for (int i = 0; i < WARMUP; i++) {
            sink += work.get();
        }
        double[] ms = new double[RUNS];
        for (int i = 0; i < RUNS; i++) {
            long t0 = System.nanoTime();
            sink += work.get();
            ms[i] = (System.nanoTime() - t0) / 1e6;
        }
        if (sink == 42) {
            System.out.println("(sink)");
        }
        Arrays.sort(ms);
        return ms;
    }

    private static void report(String what, double[] ms) {
        System.out.printf(Locale.ROOT, "  %-30s min %7.1f ms   median %7.1f ms   max %7.1f ms%n", what, ms[0],
                ms[ms.length / 2], ms[ms.length - 1]);
    }
}
