package dev.coilwise.dynamics;

import dev.coilwise.mechanics.Stress;
import dev.coilwise.model.Spring;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.ode.events.EventHandler;
import org.apache.commons.math3.ode.sampling.StepHandler;

/**
 * Wires one simulation together: the chain's force terms (elements, coil clash, gravity, damping, plus the job's own
 * terms), the detectors, the peak trackers and the history, then integrates and reports what it saw.
 */
final class EventRun {
    /**
     * What one run saw.
     *
     * @param finalState        state at the end (layout in {@link TopFace})
     * @param endTime           s
     * @param stoppedByEvent    whether a job detector ended the run (otherwise the time limit did)
     * @param maxLoadPosition   largest load position, m
     * @param peakForce         largest top-element force, N
     * @param peakStress        largest corrected element stress, Pa
     * @param firstClashTime    s, or NaN
     * @param firstClashElement 1..N+1, or 0
     * @param history           the sampled history (empty unless asked for)
     * @param energyStart       mechanical energy at the start, J
     * @param energyEnd         mechanical energy at the end, J
     */
    record Outcome(double[] finalState, double endTime, boolean stoppedByEvent, double maxLoadPosition,
                   double peakForce, double peakStress, double firstClashTime, int firstClashElement,
                   TimeHistory history, double energyStart, double energyEnd) {
    }

    /** History rows aimed for over one time scale of the run. */
    static final int HISTORY_ROWS_PER_TIME_SCALE = 400;

    private final LumpedChain chain;
    private final TopFace face;
    private final double loadMass;
    private final double loadForce;
    private final ClashForce clash;
    private final ChainEquations equations;
    private final ChainProbes probes;
    private final List<StepHandler> observers = new ArrayList<>();
    private ChainRun.Accuracy accuracy = ChainRun.Accuracy.DEFAULT;

    /**
     * @param loadMass  kg, 0 without a load
     * @param loadForce constant force on the load towards the base (drive force), N; enters the energy audit
     * @param jobTerms  the job's own force terms (drive force, guide friction)
     */
    EventRun(Spring spring, LumpedChain chain, TopFace face, double loadMass, double loadForce,
             List<ForceTerm> jobTerms) {
        this.chain = chain;
        this.face = face;
        this.loadMass = loadMass;
        this.loadForce = loadForce;
        this.clash = new ClashForce(chain, face);
        List<ForceTerm> terms = new ArrayList<>();
        terms.add(new ElasticForce(chain, face));
        terms.add(clash);
        terms.add(new GravityForce(chain, loadMass));
        if (chain.dampingCoefficient() > 0) {
            terms.add(new DampingForce(chain));
        }
        terms.addAll(jobTerms);
        this.equations = new ChainEquations(chain, loadMass, terms);
        this.probes = new ChainProbes(chain, face, clash,
                Stress.corrected(1.0, spring.meanDiameter(), spring.wireDiameter()));
    }

    ChainProbes probes() {
        return probes;
    }

    /** Integrates to {@code a} instead of {@link ChainRun.Accuracy#DEFAULT} (tests compare with a tight run). */
    EventRun accurateTo(ChainRun.Accuracy a) {
        accuracy = a;
        return this;
    }

    /** Adds a step handler that watches the run (tests use it for the energy audit). */
    EventRun observe(StepHandler observer) {
        observers.add(observer);
        return this;
    }

    /** The outcome of a run in which nothing moves: every figure read off {@code y0}. */
    Outcome still(double[] y0, boolean keepHistory) {
        int n = chain.masses();
        face.start(y0, true);
        clash.start(y0);
        TimeHistory.Builder h = new TimeHistory.Builder();
        if (keepHistory) {
            h.add(0, y0[n], y0[2 * n + 1], probes.topForce(y0), probes.peakStress(y0));
        }
        double e = probes.energy(y0, loadMass, loadForce);
        return new Outcome(y0.clone(), 0, true, y0[n], probes.topForce(y0), probes.peakStress(y0),
                clash.firstTime(), clash.firstElement(), h.build(), e, e);
    }

    /**
     * Integrates from {@code y0} at t = 0.
     *
     * @param loadOnAtStart whether the load presses on the face at the start
     * @param tEnd          time limit, s
     * @param keepHistory   whether to sample the history
     */
    Outcome run(double[] y0, boolean loadOnAtStart, List<EventHandler> jobDetectors, ChainRun.Scales scales,
                double tEnd, boolean keepHistory) {
        double[] y = y0.clone();
        int n = chain.masses();
        PeakTracker peaks = new PeakTracker(n, probes.gauges(), ChainProbes.GROUPS);
        List<StepHandler> handlers = new ArrayList<>(List.of(peaks));
        HistorySampler sampler = null;
        if (keepHistory) {
            sampler = new HistorySampler(n, scales.time() / HISTORY_ROWS_PER_TIME_SCALE, probes::topForce,
                    probes::peakStress);
            handlers.add(sampler);
        }
        handlers.addAll(observers);
        double e0 = probes.energy(y, loadMass, loadForce);
        ChainRun run = new ChainRun(chain, face, equations, jobDetectors, accuracy);
        double tFinal = run.run(y, loadOnAtStart, scales, tEnd, handlers);
        double top = Math.max(0, peaks.max(ChainProbes.TOP));
        return new Outcome(y, tFinal, tFinal < tEnd, peaks.max(ChainProbes.LOAD), probes.topForceOf(top),
                probes.stressOf(Math.max(top, peaks.max(ChainProbes.LOWER))), clash.firstTime(),
                clash.firstElement(), sampler == null ? TimeHistory.empty() : sampler.history(), e0,
                probes.energy(y, loadMass, loadForce));
    }
}
