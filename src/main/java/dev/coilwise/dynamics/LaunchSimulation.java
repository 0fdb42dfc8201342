package dev.coilwise.dynamics;

import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.Gravity;
import dev.coilwise.model.Launch;
import dev.coilwise.model.Spring;
import java.util.List;
import org.apache.commons.math3.ode.events.EventHandler.Action;

/**
 * A launch in the time domain. At t = 0 everything is at rest in static equilibrium with the top held at the cocked
 * compression, and the latch lets go. The guide's losses act as a constant friction (1 − η)·k·x_c/2 on the payload
 * while it moves out inside the guide. The payload is free once it is off the spring and past the muzzle; its apex is
 * then found ballistically. The run also ends if the payload comes to rest before it is free (it stays in the guide)
 * or after {@value #TIME_LIMIT_PERIODS} periods of the payload on the spring.
 */
final class LaunchSimulation implements JobMonitor {
    /** Time limit in periods 2π√((m + m_a/3)/k) of the payload on the spring. */
    static final double TIME_LIMIT_PERIODS = 20;

    private final Launch launch;
    private final Evaluation balance;
    private final SimulationOptions options;
    private final int n;
    private final double friction;
    private final TopFace face;
    private final EventRun run;
    private final double[] initial;
    private final ChainRun.Scales scales;
    private boolean free;
    private boolean stalled;

    LaunchSimulation(Spring spring, Launch launch, Evaluation balance, SimulationOptions options) {
        this.launch = launch;
        this.balance = balance;
        this.options = options;
        this.n = options.masses();
        double xc = balance.workingDeflection();
        LumpedChain chain = LumpedChain.of(spring, n, options.dampingRatio(),
                Gravity.STANDARD * Math.sin(launch.angle()));
        this.friction = launch.losses() * spring.rate() * xc / 2;
        this.face = new TopFace(n, Double.NEGATIVE_INFINITY, true);
        this.run = new EventRun(spring, chain, face, launch.mass(), 0, List.of(new GuideFriction(n, friction, this)));
        this.initial = new double[2 * n + 2];
        System.arraycopy(chain.staticPositionsHeld(xc), 0, initial, 0, n);
        initial[n] = xc;
        double omega = Math.sqrt(spring.rate() / (launch.mass() + spring.activeMass() / 3));
        double length = Math.max(xc, spring.deflectionToSolid());
        this.scales = new ChainRun.Scales(length, Math.max(balance.speed(), length * omega), 2 * Math.PI / omega);
    }

    /** The run, so that a caller may attach observers before {@link #simulate()}. */
    EventRun run() {
        return run;
    }

    SimulationResult simulate() {
        double push = run.probes().topForce(initial) - launch.mass() * Gravity.STANDARD * Math.sin(launch.angle());
        EventRun.Outcome o;
        if (push <= friction) {
            // Spring force does not overcome weight and guide friction: the payload does not move.
            stalled = true;
            o = run.still(initial, options.keepHistory());
        } else {
            o = run.run(initial, true, List.of(new ContactDetector(face, this), new LoadSpeedDetector(n, this)),
                    scales, TIME_LIMIT_PERIODS * scales.time(), options.keepHistory());
        }
        double[] y = o.finalState();
        double sin = Math.sin(launch.angle());
        double exit;
        double apex;
        if (free) {
            double vy = Math.max(0, -y[2 * n + 1]) * sin;
            apex = -y[n] * sin + vy * vy / (2 * Gravity.STANDARD);
            exit = Math.sqrt(2 * Gravity.STANDARD * Math.max(0, apex)) / sin;
        } else if (stalled) {
            exit = 0;
            apex = -y[n] * sin;
        } else {
            exit = Double.NaN;
            apex = Double.NaN;
        }
        SimulationSummary s = new SimulationSummary(n, initial[n], o.peakForce(), o.peakStress(),
                o.firstClashElement() > 0, o.firstClashTime(), o.firstClashElement(), Double.NaN, Double.NaN,
                Double.NaN, exit, apex, List.of(), List.of());
        return new SimulationResult(DynamicsFlags.complete(s, balance, launch), o.history());
    }

    @Override
    public Action onContact(double t, double[] y, boolean pressed) {
        if (!pressed && y[n] <= 0) {
            free = true;
            return Action.STOP;
        }
        return Action.CONTINUE;
    }

    @Override
    public Action onPassing(double t, double[] y, boolean outward) {
        if (outward && !face.loadOn()) {
            free = true;
            return Action.STOP;
        }
        return Action.CONTINUE;
    }

    @Override
    public Action onLoadSpeedZero(double t, double[] y, boolean rising) {
        if (rising) {
            stalled = true;
            return Action.STOP;
        }
        return Action.CONTINUE;
    }
}
