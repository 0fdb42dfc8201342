package dev.coilwise.dynamics;

import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.Gravity;
import dev.coilwise.model.Spring;
import java.util.List;
import org.apache.commons.math3.ode.events.EventHandler.Action;

/**
 * An arrest in the time domain. t = 0 is first contact: the load arrives at the contact speed on the face, which sits
 * on the end stop at the installed length (preloaded pocket) or on the free chain sagging under its own weight. The
 * run ends when the load, having stopped, leaves the spring: it is off the face and back at its point of first
 * contact (the stop has taken the face back, or the load has flown clear), or it came off the face above that point.
 * The rebound speed is taken there. It also ends when the load turns towards the base again before it has left (it
 * stays on the spring), or after {@value #TIME_LIMIT_PERIODS} periods of the load on the spring.
 */
final class ArrestSimulation implements JobMonitor {
    /** Time limit in periods 2π√((m + m_a/3)/k) of the load on the spring. */
    static final double TIME_LIMIT_PERIODS = 20;

    private final Arrest arrest;
    private final Evaluation balance;
    private final SimulationOptions options;
    private final int n;
    private final TopFace face;
    private final EventRun run;
    private final double[] initial;
    private final ChainRun.Scales scales;
    private double stopTime = Double.NaN;
    private double reboundSpeed = Double.NaN;

    ArrestSimulation(Spring spring, Arrest arrest, Evaluation balance, SimulationOptions options) {
        this.arrest = arrest;
        this.balance = balance;
        this.options = options;
        this.n = options.masses();
        LumpedChain chain = LumpedChain.of(spring, n, options.dampingRatio(),
                Gravity.STANDARD * Math.sin(arrest.angle()));
        double xp = balance.preloadDeflection();
        this.face = new TopFace(n, xp > 0 ? xp : Double.NEGATIVE_INFINITY, true);
        List<ForceTerm> drive = arrest.driveForce() > 0 ? List.of(new LoadForce(n, arrest.driveForce())) : List.of();
        this.run = new EventRun(spring, chain, face, arrest.mass(), arrest.driveForce(), drive);
        double[] u = xp > 0 ? chain.staticPositionsHeld(xp) : chain.staticPositionsFree();
        this.initial = new double[2 * n + 2];
        System.arraycopy(u, 0, initial, 0, n);
        initial[n] = xp > 0 ? xp : u[n - 1];
        initial[2 * n + 1] = arrest.contactSpeed();
        double omega = Math.sqrt(spring.rate() / (arrest.mass() + spring.activeMass() / 3));
        double length = Math.max(balance.workingDeflection(), spring.deflectionToSolid());
        this.scales = new ChainRun.Scales(length, Math.max(arrest.contactSpeed(), length * omega), 2 * Math.PI / omega);
    }

    /** The run, so that a caller may attach observers before {@link #simulate()}. */
    EventRun run() {
        return run;
    }

    SimulationResult simulate() {
        EventRun.Outcome o;
        if (arrest.contactSpeed() == 0 && arrest.pushForce() <= run.probes().topForce(initial)) {
            // The load arrives at rest and the spring already holds it: nothing moves.
            stopTime = 0;
            reboundSpeed = 0;
            o = run.still(initial, options.keepHistory());
        } else {
            o = run.run(initial, true, List.of(new ContactDetector(face, this), new LoadSpeedDetector(n, this),
                            new LevelDetector(n, initial[n], this)),
                    scales, TIME_LIMIT_PERIODS * scales.time(), options.keepHistory());
        }
        SimulationSummary s = new SimulationSummary(n, o.maxLoadPosition() - initial[n], o.peakForce(),
                o.peakStress(), o.firstClashElement() > 0, o.firstClashTime(), o.firstClashElement(), Double.NaN,
                stopTime, o.stoppedByEvent() ? reboundSpeed : Double.NaN, Double.NaN, Double.NaN, List.of(),
                List.of());
        return new SimulationResult(DynamicsFlags.complete(s, balance, arrest), o.history());
    }

    @Override
    public Action onContact(double t, double[] y, boolean pressed) {
        return pressed || y[n] > initial[n] ? Action.CONTINUE : leave(y);
    }

    @Override
    public Action onPassing(double t, double[] y, boolean outward) {
        return outward && !face.loadOn() ? leave(y) : Action.CONTINUE;
    }

    private Action leave(double[] y) {
        if (Double.isNaN(stopTime) || y[2 * n + 1] >= 0) {
            return Action.CONTINUE;
        }
        reboundSpeed = -y[2 * n + 1];
        return Action.STOP;
    }

    @Override
    public Action onLoadSpeedZero(double t, double[] y, boolean rising) {
        if (!rising && Double.isNaN(stopTime)) {
            stopTime = t;
        } else if (rising && !Double.isNaN(stopTime)) {
            reboundSpeed = 0;
            return Action.STOP;
        }
        return Action.CONTINUE;
    }
}
