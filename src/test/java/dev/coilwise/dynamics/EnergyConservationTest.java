package dev.coilwise.dynamics;

import static org.assertj.core.api.Assertions.assertThat;

import dev.coilwise.mechanics.DesignEvaluator;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.Launch;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import java.util.OptionalDouble;
import org.apache.commons.math3.ode.sampling.StepHandler;
import org.apache.commons.math3.ode.sampling.StepInterpolator;
import org.junit.jupiter.api.Test;

/**
 * Without damping, friction or clash the model is conservative (contact, separation and the end stop do no work),
 * so its mechanical energy must stay at the initial value: a check of the integrator and of the event handling.
 * Steel density, realistic loads; tolerance 1e-6 of the initial energy.
 */
class EnergyConservationTest {
    private static final Spring SPRING = Fixtures.spring();

    /** Records the largest departure of the energy from its initial value, at 4 points in every step. */
    private static final class Audit implements StepHandler {
        private final EventRun run;
        private final double mass;
        private final double force;
        double initial;
        double worst;

        Audit(EventRun run, double mass, double force) {
            this.run = run;
            this.mass = mass;
            this.force = force;
        }

        @Override
        public void init(double t0, double[] y0, double t) {
            initial = run.probes().energy(y0, mass, force);
        }

        @Override
        public void handleStep(StepInterpolator i, boolean last) {
            for (int k = 1; k <= 4; k++) {
                i.setInterpolatedTime(i.getPreviousTime() + k * (i.getCurrentTime() - i.getPreviousTime()) / 4);
                double e = run.probes().energy(i.getInterpolatedState(), mass, force);
                worst = Math.max(worst, Math.abs(e - initial));
            }
        }
    }

    private static void assertArrestConserves(Requirement r) {
        Arrest a = (Arrest) r.job();
        Evaluation e = DesignEvaluator.evaluate(SPRING, r);
        ArrestSimulation sim = new ArrestSimulation(SPRING, a, e, SimulationOptions.defaults());
        Audit audit = new Audit(sim.run(), a.mass(), a.driveForce());
        sim.run().observe(audit);
        SimulationSummary s = sim.simulate().summary();
        assertThat(s.coilClash()).isFalse();
        assertThat(s.reboundSpeed()).isPositive();
        assertThat(audit.worst).isLessThanOrEqualTo(1e-6 * Math.abs(audit.initial));
    }

    @Test
    void dropOnSteelSpringConservesEnergy() {
        assertArrestConserves(Fixtures.drop(2, 0.02));
    }

    @Test
    void rampWithDriveForceIntoPreloadedPocketConservesEnergy() {
        assertArrestConserves(Fixtures.requirement(new Arrest(2, 1.0, Math.toRadians(30), 20, Double.NaN),
                OptionalDouble.of(0.070)));
    }

    @Test
    void launchWithoutLossesConservesEnergy() {
        Requirement r = Fixtures.launch(0.2, 0.5, Math.toRadians(60), 0);
        Evaluation e = DesignEvaluator.evaluate(SPRING, r);
        LaunchSimulation sim = new LaunchSimulation(SPRING, (Launch) r.job(), e, SimulationOptions.defaults());
        Audit audit = new Audit(sim.run(), 0.2, 0);
        sim.run().observe(audit);
        SimulationSummary s = sim.simulate().summary();
        assertThat(s.exitSpeed()).isPositive();
        assertThat(audit.worst).isLessThanOrEqualTo(1e-6 * Math.abs(audit.initial));
    }

    @Test
    void dampingOnlyRemovesEnergyAndSlowsTheRebound() {
        Requirement r = Fixtures.drop(2, 0.02);
        Evaluation e = DesignEvaluator.evaluate(SPRING, r);
        ArrestSimulation sim = new ArrestSimulation(SPRING, (Arrest) r.job(), e,
                SimulationOptions.defaults().withDampingRatio(0.05));
        double[] last = {Double.NaN};
        boolean[] rose = {false};
        sim.run().observe(new StepHandler() {
            @Override
            public void init(double t0, double[] y0, double t) {
                last[0] = sim.run().probes().energy(y0, 2, 0);
            }

            @Override
            public void handleStep(StepInterpolator i, boolean isLast) {
                i.setInterpolatedTime(i.getCurrentTime());
                double en = sim.run().probes().energy(i.getInterpolatedState(), 2, 0);
                rose[0] |= en > last[0] + 1e-9 * Math.abs(last[0]);
                last[0] = en;
            }
        });
        double damped = sim.simulate().summary().reboundSpeed();
        double undamped = Simulator.simulate(SPRING, r, e, SimulationOptions.defaults()).summary().reboundSpeed();
        assertThat(rose[0]).isFalse();
        assertThat(damped).isLessThan(undamped);
    }
}
