package dev.coilwise.dynamics;

import dev.coilwise.error.InternalFaultException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.apache.commons.math3.exception.MathIllegalArgumentException;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.ode.events.EventHandler;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.apache.commons.math3.ode.sampling.StepHandler;

/**
 * One integration of the chain and load with the Dormand–Prince 8(5,3) integrator of Commons Math, every
 * discontinuity located by an event handler, to the tolerances of an {@link Accuracy} ({@link Accuracy#DEFAULT}
 * unless a test asks for another).
 */
final class ChainRun {
    /** Event times are located to this fraction of the time scale. */
    static final double EVENT_CONVERGENCE = 1e-12;
    /** Iterations allowed to locate one event. */
    static final int EVENT_ITERATIONS = 200;
    /** Longest step, as a fraction of the time scale. */
    static final double MAX_STEP = 1.0 / 50;
    /** Shortest step, as a fraction of the time scale; a smaller step means the solution broke down. */
    static final double MIN_STEP = 1e-14;
    /** Derivative evaluations allowed in one run. */
    static final int MAX_EVALUATIONS = 50_000_000;

    /**
     * Scales of one run.
     *
     * @param length m, e.g. the expected compression
     * @param speed  m/s, e.g. the contact speed
     * @param time   s, e.g. the period of the load on the spring
     */
    record Scales(double length, double speed, double time) {
    }

    /**
     * Tolerances of the integrator's error control.
     *
     * @param relative relative tolerance of every component
     * @param absolute absolute tolerance as a fraction of the run's length scale (positions) and speed scale (speeds)
     */
    record Accuracy(double relative, double absolute) {
        /**
         * 3e-7 relative and absolute: without coil clash the reported figures then lie within 7e-6 of a run at 1e-11
         * (measured; the bound tested is 2e-5, a fifth of the last digit printed) and the energy of an undamped run
         * within 2e-7 of its start (its test allows 1e-6); with coil clash within the spread of tight runs
         * (docs/dynamics.md, section 3).
         */
        static final Accuracy DEFAULT = new Accuracy(3e-7, 3e-7);

        Accuracy {
            if (!(relative > 0 && relative < 1e-3 && absolute > 0 && absolute < 1e-3)) {
                throw new IllegalArgumentException("integrator tolerances must lie in (0, 1e-3), got " + relative
                        + " and " + absolute);
            }
        }
    }

    private final LumpedChain chain;
    private final TopFace face;
    private final ChainEquations equations;
    private final List<EventHandler> detectors;
    private final Accuracy accuracy;

    /**
     * @param jobDetectors the job's own detectors (contact, load speed), beside those the force terms declare
     */
    ChainRun(LumpedChain chain, TopFace face, ChainEquations equations, List<EventHandler> jobDetectors,
             Accuracy accuracy) {
        this.chain = chain;
        this.accuracy = accuracy;
        this.face = face;
        this.equations = equations;
        List<EventHandler> all = new ArrayList<>(jobDetectors);
        if (face.hasStop()) {
            all.add(new SeatDetector(face));
        }
        for (ForceTerm term : equations.terms()) {
            all.addAll(term.detectors());
        }
        this.detectors = List.copyOf(all);
    }

    /**
     * Integrates from {@code y} at t = 0 until a detector stops the run or {@code tEnd}; {@code y} holds the final
     * state afterwards.
     *
     * @return the final time, s
     */
    double run(double[] y, boolean loadOnAtStart, Scales scales, double tEnd, List<StepHandler> handlers) {
        face.start(y, loadOnAtStart);
        for (ForceTerm term : equations.terms()) {
            term.start(y);
        }
        int n = chain.masses();
        double[] abs = new double[equations.getDimension()];
        Arrays.fill(abs, 0, n + 1, accuracy.absolute() * scales.length());
        Arrays.fill(abs, n + 1, abs.length, accuracy.absolute() * scales.speed());
        double[] rel = new double[abs.length];
        Arrays.fill(rel, accuracy.relative());
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(MIN_STEP * scales.time(),
                MAX_STEP * scales.time(), abs, rel);
        integrator.setMaxEvaluations(MAX_EVALUATIONS);
        integrator.addEventHandler(new CombinedDetector(detectors, equations, n, scales.time()),
                chain.shortestPeriod() / 2, EVENT_CONVERGENCE * scales.time(), EVENT_ITERATIONS);
        handlers.forEach(integrator::addStepHandler);
        try {
            return integrator.integrate(equations, 0, y, tEnd, y);
        } catch (MathIllegalArgumentException | MathIllegalStateException e) {
            throw new InternalFaultException(String.format(Locale.ROOT,
                    "the time-domain simulation broke down (N = %d, time scale %.4g s, end %.4g s): %s",
                    n, scales.time(), tEnd, e.getMessage()), e);
        }
    }
}
