package dev.coilwise.dynamics;

import dev.coilwise.materials.MaterialTable;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.Launch;
import dev.coilwise.model.Requirement;
import dev.coilwise.requirement.RequirementReader;
import dev.coilwise.search.PrunedSearch;
import dev.coilwise.search.Sizer;
import dev.coilwise.search.SizingOptions;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.apache.commons.math3.ode.sampling.StepHandler;
import org.apache.commons.math3.ode.sampling.StepInterpolator;

/**
 * Prints what the time-domain check of one requirement's shortlist costs, the way {@code size} runs it (every
 * shortlisted design simulated with its history, in parallel over the designs); asserts nothing. Run it once per
 * requirement file in a fresh JVM, so that the first repetition is the cold figure (classes loaded, code not yet
 * compiled), after {@code mvn -q -B test-compile dependency:build-classpath -Dmdep.outputFile=target/cp.txt}:
 * {@code java -cp target/classes:target/test-classes:$(cat target/cp.txt)
 * dev.coilwise.dynamics.ShortlistSimulationBenchmark requirements/FILE.yaml [repetitions]}.
 *
 * <p>Printed: the wall time of the first repetition and the median and minimum of the others (all designs, in
 * parallel), the median and minimum CPU time of one thread simulating the designs one after another (the minimum is
 * the least disturbed by other work on the machine), and the integration steps per design.
 */
public final class ShortlistSimulationBenchmark {
    private static final ThreadMXBean CPU = ManagementFactory.getThreadMXBean();

    private ShortlistSimulationBenchmark() {
    }

    public static void main(String[] args) {
        Path file = Path.of(args[0]);
        int reps = args.length > 1 ? Integer.parseInt(args[1]) : 10;
        MaterialTable table = MaterialTable.loadDefault();
        Requirement req = new RequirementReader(table).read(file);
        List<Evaluation> designs = new Sizer(table, new PrunedSearch(), SizingOptions.searchOnly()).size(req, List.of())
                .shortlist().stream().map(e -> e.evaluation()).toList();
        SimulationOptions opt = SimulationOptions.defaults().withHistory(true);
        double[] wall = new double[reps];
        for (int r = 0; r < reps; r++) {
            long t0 = System.nanoTime();
            designs.parallelStream().map(e -> Simulator.simulate(e.spring(), req, e, opt)).toList();
            wall[r] = (System.nanoTime() - t0) / 1e6;
        }
        double[] cpu = new double[reps];
        for (int r = 0; r < reps; r++) {
            long c0 = CPU.getCurrentThreadCpuTime();
            designs.forEach(e -> Simulator.simulate(e.spring(), req, e, opt));
            cpu[r] = (CPU.getCurrentThreadCpuTime() - c0) / 1e6;
        }
        double[] warm = Arrays.copyOfRange(wall, 1, reps);
        Arrays.sort(warm);
        Arrays.sort(cpu);
        long steps = designs.stream().mapToLong(e -> steps(req, e, opt)).sum();
        System.out.printf(Locale.ROOT, "%-30s %2d designs: first %6.1f ms, warm median %6.1f ms (min %6.1f), "
                        + "one thread CPU median %6.1f ms (min %6.1f), %5d steps per design%n", file.getFileName(),
                designs.size(), wall[0], warm[warm.length / 2], warm[0], cpu[reps / 2], cpu[0],
                steps / Math.max(1, designs.size()));
    }

    /** Integration steps of one simulation. */
    private static long steps(Requirement req, Evaluation e, SimulationOptions opt) {
        long[] count = {0};
        StepHandler counter = new StepHandler() {
            @Override
            public void init(double t0, double[] y0, double t) {
            }

            @Override
            public void handleStep(StepInterpolator interpolator, boolean isLast) {
                count[0]++;
            }
        };
        if (req.job() instanceof Arrest a) {
            ArrestSimulation sim = new ArrestSimulation(e.spring(), a, e, opt);
            sim.run().observe(counter);
            sim.simulate();
        } else {
            LaunchSimulation sim = new LaunchSimulation(e.spring(), (Launch) req.job(), e, opt);
            sim.run().observe(counter);
            sim.simulate();
        }
        return count[0];
    }
}
