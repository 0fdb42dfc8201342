package dev.coilwise.dynamics;

import dev.coilwise.error.Check;
import dev.coilwise.error.InternalFaultException;
import dev.coilwise.mechanics.DesignEvaluator;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.Launch;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;

/**
 * Time-domain check of one design: the spring as a chain of lumped masses (see {@link LumpedChain} and
 * docs/dynamics.md) driven through its arrest or launch, compared with the energy balance of the same design.
 * Pure and thread-safe: every call builds its own model.
 */
public final class Simulator {
    private Simulator() {
    }

    /**
     * Simulates {@code spring} doing the job of {@code req}.
     *
     * @param balance the energy balance of the same spring and requirement ({@link DesignEvaluator#evaluate})
     */
    public static SimulationResult simulate(Spring spring, Requirement req, Evaluation balance,
                                            SimulationOptions opt) {
        Check.notNull("spring", spring);
        Check.notNull("requirement", req);
        Check.notNull("energy balance", balance);
        Check.notNull("simulation options", opt);
        // The same instance in the usual call; a record's first equals() costs a cold JVM some 20 ms of set-up.
        boolean sameSpring = balance.spring() == spring || balance.spring().equals(spring);
        if (!sameSpring || !balance.job().equals(req.job().key())) {
            throw new InternalFaultException("the energy balance handed to the simulator belongs to another spring "
                    + "or job (" + balance.job() + " vs " + req.job().key() + ")");
        }
        if (req.job() instanceof Arrest a) {
            return new ArrestSimulation(spring, a, balance, opt).simulate();
        }
        return new LaunchSimulation(spring, (Launch) req.job(), balance, opt).simulate();
    }

    /** Evaluates the energy balance, then simulates. */
    public static SimulationResult simulate(Spring spring, Requirement req, SimulationOptions opt) {
        return simulate(spring, req, DesignEvaluator.evaluate(spring, req), opt);
    }
}
