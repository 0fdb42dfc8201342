package dev.coilwise.scatter;

import dev.coilwise.model.Requirement;
import java.lang.management.ManagementFactory;
import dev.coilwise.model.Spring;
import dev.coilwise.model.SpringOptions;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * Prints how long the Monte Carlo takes for a shortlist of 10 designs at the default 10 000 samples each, with the
 * fatigue check on and a modulus scatter (the slowest path): the first call (cold JIT, as in a fresh CLI run)
 * and then repeated calls, wall time and the process's CPU time (every thread: the run is parallel, and the JIT's
 * and collector's threads count too; the clock behind it ticks in 10 ms steps on Linux). Figures only; nothing is
 * asserted about time.
 * Run: {@code mvn -B test -Dtest=ScatterBenchmark -Dtest.excludedGroups=fuzz}; see docs/reliability-scatter.md.
 */
@Tag("benchmark")
class ScatterBenchmark {
    private static final int REPEATS = 5;
    private static final com.sun.management.OperatingSystemMXBean OS =
            (com.sun.management.OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean();

    @Test
    void shortlistOfTenAtDefaultSamples() {
        List<Spring> shortlist = new ArrayList<>();
        for (int i = 0; i < 10; i++) {
            shortlist.add(ScatterFixtures.SPRING.withActiveCoils(8 + 0.5 * i));
        }
        report("arrest", shortlist, withCycles(ScatterFixtures.arrest(OptionalDouble.empty())));
        report("launch", shortlist, withCycles(ScatterFixtures.launch(true)));
    }

    private static Requirement withCycles(Requirement r) {
        SpringOptions o = r.spring();
        SpringOptions cyclic = new SpringOptions(o.materials(), o.ends(), o.indexMin(), o.indexMax(), o.coilsMin(),
                o.coilsMax(), o.clashAllowance(), o.solidSafe(), o.setRemoved(), o.seating(), o.wireSeries(),
                OptionalDouble.of(1e6), false, 1.0, 2);
        return new Requirement(r.title(), r.job(), r.limits(), r.envelope(), cyclic, r.ranking(), r.units(), r.stock());
    }

    private static void report(String job, List<Spring> shortlist, Requirement req) {
        ScatterSettings settings = ScatterSettings.defaults();
        ToleranceSource tol = ToleranceSource.fixed(ScatterFixtures.TYPICAL);
        double[] seconds = new double[REPEATS + 1];
        double[] cpu = new double[REPEATS + 1];
        for (int r = 0; r <= REPEATS; r++) { // run 0 is the first call of this job in the JVM
            long c0 = OS.getProcessCpuTime();
            long t0 = System.nanoTime();
            MonteCarlo.summarise(shortlist, req, tol, settings, ScatterProgress.NONE);
            seconds[r] = (System.nanoTime() - t0) * 1e-9;
            cpu[r] = (OS.getProcessCpuTime() - c0) * 1e-9;
        }
        double[] wall = Arrays.copyOfRange(seconds, 1, REPEATS + 1);
        double[] busy = Arrays.copyOfRange(cpu, 1, REPEATS + 1);
        Arrays.sort(wall);
        Arrays.sort(busy);
        long made = (long) shortlist.size() * settings.samples();
        System.out.printf(Locale.ROOT, "scatter %s: %d designs x %d samples, %d processors, load average %.1f%n", job,
                shortlist.size(), settings.samples(), Runtime.getRuntime().availableProcessors(),
                ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage());
        System.out.printf(Locale.ROOT, "  first call: wall %.3f s, process CPU %.3f s%n", seconds[0], cpu[0]);
        System.out.printf(Locale.ROOT, "  next %d calls: wall best %.3f / median %.3f / worst %.3f s; process CPU median"
                        + " %.3f s (%.2f us per made spring)%n", REPEATS, wall[0], wall[REPEATS / 2], wall[REPEATS - 1],
                busy[REPEATS / 2], busy[REPEATS / 2] / made * 1e6);
    }
}
