package dev.coilwise.dynamics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import dev.coilwise.mechanics.DesignEvaluator;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Launch;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import java.util.List;
import java.util.OptionalDouble;
import java.util.function.ToDoubleFunction;
import java.util.stream.DoubleStream;
import org.junit.jupiter.api.Test;

/**
 * The default integrator tolerances ({@link ChainRun.Accuracy#DEFAULT}) against tight runs of the same design.
 * Without coil clash every reported figure lies within {@value #BOUND} of a run at 1e-11, on arrests and launches of
 * varied springs, with damping, a pocket, a sudden load, losses, a light payload, and at 5, 20 and 60 masses (measured:
 * 6.1e-6 at worst, on peak force and stress). Figures are printed to 3–4 significant figures, whose last digit is
 * worth at least 1e-4 of the figure, so the bound is at most a fifth of it. With coil clash the figures after the
 * first clash depend on the exact timing of the coils' contacts and do not settle as the tolerance is tightened;
 * there the default must fall within the spread of tight runs. Non-regression of the numerical method; the physics is
 * validated by the other tests of this package.
 */
class IntegratorAccuracyTest {
    /** Largest relative change of a reported figure allowed. */
    private static final double BOUND = 2e-5;
    private static final ChainRun.Accuracy TIGHT = new ChainRun.Accuracy(1e-11, 1e-11);

    private static SimulationSummary run(Spring spring, Requirement r, SimulationOptions opt, ChainRun.Accuracy a) {
        Evaluation e = DesignEvaluator.evaluate(spring, r);
        if (r.job() instanceof Arrest arrest) {
            ArrestSimulation sim = new ArrestSimulation(spring, arrest, e, opt);
            sim.run().accurateTo(a);
            return sim.simulate().summary();
        }
        LaunchSimulation sim = new LaunchSimulation(spring, (Launch) r.job(), e, opt);
        sim.run().accurateTo(a);
        return sim.simulate().summary();
    }

    private static void assertClose(String what, double actual, double tight) {
        if (Double.isNaN(tight)) {
            assertThat(actual).as(what).isNaN();
        } else {
            assertThat(actual).as(what).isCloseTo(tight, within(BOUND * Math.abs(tight) + 1e-15));
        }
    }

    private static void assertMatchesTightRun(Spring spring, Requirement r, SimulationOptions opt) {
        SimulationSummary d = run(spring, r, opt, ChainRun.Accuracy.DEFAULT);
        SimulationSummary t = run(spring, r, opt, TIGHT);
        assertClose("max compression", d.maxCompression(), t.maxCompression());
        assertClose("peak force", d.peakForce(), t.peakForce());
        assertClose("peak stress", d.peakStress(), t.peakStress());
        assertClose("first clash time", d.firstClashTime(), t.firstClashTime());
        assertClose("stop time", d.stopTime(), t.stopTime());
        assertClose("rebound speed", d.reboundSpeed(), t.reboundSpeed());
        assertClose("exit speed", d.exitSpeed(), t.exitSpeed());
        assertClose("apex", d.apex(), t.apex());
        assertThat(d.deviationPct()).as("deviation").isCloseTo(t.deviationPct(), within(1e-3));
        assertThat(d.firstClashElement()).as("first clash element").isEqualTo(t.firstClashElement());
        assertThat(d.flags()).hasSameSizeAs(t.flags());
        assertThat(d.notes()).hasSameSizeAs(t.notes());
    }

    @Test
    void arrestsMatchTheTightRun() {
        Spring s = Fixtures.spring();
        SimulationOptions opt = SimulationOptions.defaults();
        assertMatchesTightRun(s, Fixtures.drop(2, 0.02), opt);
        assertMatchesTightRun(s, Fixtures.drop(0.2, 0.10), opt);
        assertMatchesTightRun(s, Fixtures.arrest(5, 0, Math.PI / 2, 0), opt);
        assertMatchesTightRun(s, Fixtures.requirement(new Arrest(2, 1.0, Math.toRadians(30), 20, Double.NaN),
                OptionalDouble.of(0.070)), opt);
        assertMatchesTightRun(s, Fixtures.drop(2, 0.02), opt.withDampingRatio(0.05));
        assertMatchesTightRun(s, Fixtures.drop(2, 0.02), opt.withMasses(5));
        assertMatchesTightRun(s, Fixtures.drop(2, 0.02), opt.withMasses(60));
    }

    @Test
    void launchesMatchTheTightRun() {
        Spring s = Fixtures.spring();
        SimulationOptions opt = SimulationOptions.defaults();
        assertMatchesTightRun(s, Fixtures.launch(0.2, 0.5, Math.PI / 2, 0.1), opt);
        assertMatchesTightRun(s, Fixtures.launch(0.2, 0.5, Math.PI / 4, 0.2), opt);
        assertMatchesTightRun(s, Fixtures.launch(s.activeMass() / 5, 0.5, Math.PI / 2, 0), opt);
        assertMatchesTightRun(s, Fixtures.launch(0.2, 0.01, Math.PI / 2, 0.9), opt);
        assertMatchesTightRun(s, Fixtures.launch(0.2, 0.5, Math.PI / 2, 0.1), opt.withMasses(60));
    }

    // A drop past solid (0.30 m onto L0 − Ls = 44 mm). The first clash (time, element) is well determined and must
    // match to the bound. After it, tight runs differ among themselves (at 1e-9 to 1e-13: 2.7e-5 in compression,
    // 0.11 % in stop time, 0.7 % in stress, 0.5 % in rebound speed, 22 % in peak force, which the coil-contact
    // spikes set); the default must lie within four times that spread of their median.
    @Test
    void clashRunLiesWithinTheSpreadOfTightRuns() {
        Spring s = Fixtures.spring();
        Requirement r = Fixtures.drop(2, 0.30);
        SimulationOptions opt = SimulationOptions.defaults();
        SimulationSummary d = run(s, r, opt, ChainRun.Accuracy.DEFAULT);
        List<SimulationSummary> tight = DoubleStream.of(1e-9, 1e-10, 1e-11, 1e-12, 1e-13)
                .mapToObj(tol -> run(s, r, opt, new ChainRun.Accuracy(tol, tol))).toList();
        assertThat(d.coilClash()).isTrue();
        for (SimulationSummary t : tight) {
            assertClose("first clash time", d.firstClashTime(), t.firstClashTime());
            assertThat(d.firstClashElement()).isEqualTo(t.firstClashElement());
        }
        assertWithinSpread("max compression", d, tight, SimulationSummary::maxCompression);
        assertWithinSpread("peak force", d, tight, SimulationSummary::peakForce);
        assertWithinSpread("peak stress", d, tight, SimulationSummary::peakStress);
        assertWithinSpread("stop time", d, tight, SimulationSummary::stopTime);
        assertWithinSpread("rebound speed", d, tight, SimulationSummary::reboundSpeed);
    }

    private static void assertWithinSpread(String what, SimulationSummary d, List<SimulationSummary> tight,
                                           ToDoubleFunction<SimulationSummary> figure) {
        double[] t = tight.stream().mapToDouble(figure).sorted().toArray();
        double median = t[t.length / 2];
        double spread = t[t.length - 1] - t[0];
        assertThat(figure.applyAsDouble(d)).as(what).isCloseTo(median, within(4 * spread + BOUND * Math.abs(median)));
    }

    // Springs of other wire, index and coil counts (music wire, closed and ground, 45 mm of travel to solid).
    @Test
    void otherSpringsMatchTheTightRun() {
        for (double d : new double[]{2.5e-3, 3.5e-3, 4.5e-3}) {
            for (double index : new double[]{6, 10}) {
                double na = index > 8 ? 7 : 12;
                double ls = EndType.CLOSED_GROUND.solidLength(d, na + 2);
                Spring s = new Spring(Fixtures.musicWire(), EndType.CLOSED_GROUND, d, index * d, na, ls + 0.045);
                assertMatchesTightRun(s, Fixtures.drop(3, 0.05), SimulationOptions.defaults());
                assertMatchesTightRun(s, Fixtures.launch(0.1, 0.8, Math.PI / 2, 0.1), SimulationOptions.defaults());
            }
        }
    }
}
