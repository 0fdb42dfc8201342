package dev.coilwise.dynamics;

import dev.coilwise.mechanics.DesignEvaluator;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * Prints how long simulations take; asserts nothing about time (performance is shown by figures, not by timed unit
 * tests). Targets: one simulation at N = 20 under 20 ms, a shortlist of 10 designs under 200 ms. Excluded from the
 * default run by its tag; run it with
 * {@code java -cp target/classes:target/test-classes:<deps> dev.coilwise.dynamics.SimulationBenchmark}.
 */
@Tag("benchmark")
class SimulationBenchmark {
    private static final int WARM_UP = 40;
    private static final int REPEATS = 40;
    private static final ThreadMXBean CPU = ManagementFactory.getThreadMXBean();

    /** Median and minimum wall and CPU time of {@code task}, ms. */
    private static String time(Runnable task) {
        for (int i = 0; i < WARM_UP; i++) {
            task.run();
        }
        double[] wall = new double[REPEATS];
        double[] cpu = new double[REPEATS];
        for (int i = 0; i < REPEATS; i++) {
            long w0 = System.nanoTime();
            long c0 = CPU.getCurrentThreadCpuTime();
            task.run();
            cpu[i] = (CPU.getCurrentThreadCpuTime() - c0) / 1e6;
            wall[i] = (System.nanoTime() - w0) / 1e6;
        }
        Arrays.sort(wall);
        Arrays.sort(cpu);
        return String.format(Locale.ROOT, "wall median %.1f ms (min %.1f), cpu median %.1f ms (min %.1f)",
                wall[REPEATS / 2], wall[0], cpu[REPEATS / 2], cpu[0]);
    }

    /** Ten nearby designs, as a search would shortlist them (benchmark input only). */
    private static List<Spring> shortlist() {
        List<Spring> out = new ArrayList<>();
        for (double d : new double[]{2.8e-3, 3.0e-3, 3.2e-3, 3.5e-3, 3.8e-3}) {
            for (double na : new double[]{8, 11}) {
                double dm = 8 * d;
                double ls = EndType.CLOSED_GROUND.solidLength(d, na + 2);
                out.add(new Spring(Fixtures.musicWire(), EndType.CLOSED_GROUND, d, dm, na, ls + 0.045));
            }
        }
        return out;
    }

    @Test
    void printTimings() {
        SimulationOptions opt = SimulationOptions.defaults();
        Spring s = Fixtures.spring();
        Requirement drop = Fixtures.drop(2, 0.02);
        Evaluation eDrop = DesignEvaluator.evaluate(s, drop);
        Requirement launch = Fixtures.launch(0.2, 0.5, Math.PI / 2, 0.1);
        Evaluation eLaunch = DesignEvaluator.evaluate(s, launch);
        System.out.println("one arrest (2 kg dropped 20 mm), N = 20: "
                + time(() -> Simulator.simulate(s, drop, eDrop, opt)));
        System.out.println("one launch (0.2 kg to 0.5 m), N = 20:    "
                + time(() -> Simulator.simulate(s, launch, eLaunch, opt)));
        List<Spring> designs = shortlist();
        List<Evaluation> evals = designs.stream().map(d -> DesignEvaluator.evaluate(d, drop)).toList();
        System.out.println("shortlist of 10 arrest designs, N = 20:  " + time(() -> {
            for (int i = 0; i < designs.size(); i++) {
                Simulator.simulate(designs.get(i), drop, evals.get(i), opt);
            }
        }));
        List<Evaluation> launchEvals = designs.stream().map(d -> DesignEvaluator.evaluate(d, launch)).toList();
        System.out.println("shortlist of 10 launch designs, N = 20:  " + time(() -> {
            for (int i = 0; i < designs.size(); i++) {
                Simulator.simulate(designs.get(i), launch, launchEvals.get(i), opt);
            }
        }));
        System.out.println("cores available: " + Runtime.getRuntime().availableProcessors()
                + ", load average: " + ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage());
    }

    public static void main(String[] args) {
        new SimulationBenchmark().printTimings();
    }
}
