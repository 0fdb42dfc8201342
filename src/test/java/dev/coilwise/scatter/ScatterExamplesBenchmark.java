package dev.coilwise.scatter;

import static org.assertj.core.api.Assertions.assertThat;

import dev.coilwise.catalog.CatalogReader;
import dev.coilwise.catalog.StockPart;
import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import dev.coilwise.requirement.RequirementReader;
import dev.coilwise.search.PrunedSearch;
import dev.coilwise.search.Sizer;
import dev.coilwise.search.SizingOptions;
import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * Prints how long the Monte Carlo of {@code size} takes on the example requirements: the shortlist the search gives,
 * at the default settings (10 000 made springs per design), tolerances of EN 15800. For each file: the first call
 * (the first file of the run is as cold as the JVM of a test run gets) and five more, wall time and the process's CPU
 * time (every thread, the JIT's included); then the reference path that builds and evaluates every made spring in
 * full, one design after the other, once, whose summaries must equal the run's. Figures only: nothing is asserted
 * about time. See docs/performance.md, section Monte Carlo.
 *
 * <p>Run: {@code mvn -B test -Dtest=ScatterExamplesBenchmark -Dtest.excludedGroups=fuzz}; one file, e.g. for a cold
 * first call of each in turn: add {@code -Dbenchmark.requirements=requirements/launch-vertical-ball.yaml} (a folder or
 * a comma-separated list of files; default {@code requirements}).
 */
@Tag("benchmark")
class ScatterExamplesBenchmark {
    private static final int REPEATS = 5;
    private static final com.sun.management.OperatingSystemMXBean OS =
            (com.sun.management.OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean();

    @Test
    void examplesAtDefaultSettings() throws IOException {
        MaterialTable table = MaterialTable.loadDefault();
        for (Path file : files(System.getProperty("benchmark.requirements", "requirements"))) {
            Requirement req = new RequirementReader(table).read(file);
            List<StockPart> stock = new ArrayList<>();
            for (Path p : req.stock()) {
                stock.addAll(new CatalogReader(table).read(p).parts());
            }
            List<Spring> designs = new Sizer(table, new PrunedSearch(), SizingOptions.searchOnly()).size(req, stock)
                    .shortlist().stream().map(e -> e.evaluation().spring()).toList();
            ScatterSettings settings = ScatterSettings.defaults();
            double[] wall = new double[REPEATS + 1];
            double[] cpu = new double[REPEATS + 1];
            List<ScatterSummary> run = List.of();
            for (int r = 0; r <= REPEATS; r++) {
                long c0 = OS.getProcessCpuTime();
                long t0 = System.nanoTime();
                run = MonteCarlo.summarise(designs, req, ToleranceSource.en15800(), settings, ScatterProgress.NONE);
                wall[r] = (System.nanoTime() - t0) * 1e-6;
                cpu[r] = (OS.getProcessCpuTime() - c0) * 1e-6;
            }
            long c0 = OS.getProcessCpuTime();
            long t0 = System.nanoTime();
            List<ScatterSummary> reference = new ArrayList<>();
            for (Spring s : designs) {
                HalfWidths h = ToleranceSource.en15800().halfWidths(s, req.spring().toleranceGrade());
                reference.add(MonteCarlo.sampleByRecords(s, req, h, settings).summary());
            }
            double referenceWall = (System.nanoTime() - t0) * 1e-6;
            double referenceCpu = (OS.getProcessCpuTime() - c0) * 1e-6;
            assertThat(run).isEqualTo(reference);
            double[] w = Arrays.copyOfRange(wall, 1, REPEATS + 1);
            double[] c = Arrays.copyOfRange(cpu, 1, REPEATS + 1);
            Arrays.sort(w);
            Arrays.sort(c);
            System.out.printf(Locale.ROOT, "%s: %d designs x %d samples, %d processors, load average %.1f%n",
                    file.getFileName(), designs.size(), settings.samples(), Runtime.getRuntime().availableProcessors(),
                    OS.getSystemLoadAverage());
            System.out.printf(Locale.ROOT, "  first call: wall %.1f ms, CPU %.0f ms%n", wall[0], cpu[0]);
            System.out.printf(Locale.ROOT, "  next %d: wall best %.1f / median %.1f / worst %.1f ms, CPU median %.0f ms%n",
                    REPEATS, w[0], w[REPEATS / 2], w[REPEATS - 1], c[REPEATS / 2]);
            System.out.printf(Locale.ROOT, "  reference path (records, one design after the other): wall %.1f ms, CPU"
                    + " %.0f ms; same summaries%n", referenceWall, referenceCpu);
        }
    }

    private static List<Path> files(String spec) throws IOException {
        List<Path> out = new ArrayList<>();
        for (String part : spec.split(",")) {
            Path p = Path.of(part.strip());
            if (Files.isDirectory(p)) {
                try (Stream<Path> s = Files.list(p)) {
                    s.filter(f -> f.toString().endsWith(".yaml")).sorted().forEach(out::add);
                }
            } else {
                out.add(p);
            }
        }
        return out;
    }
}
