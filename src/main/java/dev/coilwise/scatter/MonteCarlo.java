package dev.coilwise.scatter;

import dev.coilwise.error.CoilwiseException;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.IntStream;

/**
 * Seeded Monte Carlo over manufacturing tolerances: draws made springs around a design, works each in the machine
 * built for the nominal design ({@link Installation}) and collects the spread of the working figures and the share
 * that meets the requirement. Pure computation; the same seed gives the same result.
 *
 * <p>A made spring meets the requirement when every hard limit of the design evaluation holds for it (the spring
 * index and coil-count ranges aside: they are rules for the drawing, not limits on the part), and, for a launch,
 * when its apex lies in the band of {@link ScatterSettings} around the target.
 *
 * <p>Deviations: each of d, D, L0, Na and G is drawn independently from a normal distribution whose σ is a third of
 * the half-width, truncated at the half-width ({@link DeviationSampler}). Independence is the uncompensated case: a
 * maker who adjusts L0 or the coil count to hit a test force narrows the real spread.
 *
 * <p>How it runs: every design of a run takes the same deviations (one seeded stream), so they are drawn once, in
 * blocks of {@value #BLOCK} made springs, and shared; the pool's threads work the first made springs of a block while
 * the rest are being drawn ({@link SampleBlock}). Each made spring is worked by {@link SampleEvaluator}, which gives
 * exactly what building it ({@link SpringMaker}) and evaluating it ({@link Installation}) gives, without the records.
 * The work is cut into tasks of {@value #PROGRESS_STEP} made springs of one design that threads take in turn; every
 * task writes only its own samples, so the result does not depend on the threads or their timing.
 */
public final class MonteCarlo {
    /** Samples between progress calls, and the made springs of one task. */
    public static final int PROGRESS_STEP = 500;

    /** Made springs whose deviations are drawn at once (their 5 draws each held in memory: 640 kB). */
    static final int BLOCK = 1 << 14;

    private MonteCarlo() {
    }

    /** Draws {@code settings.samples()} made springs of one design. */
    public static ScatterSamples sample(Spring nominal, Requirement req, HalfWidths halfWidths, ScatterSettings settings,
                                        ScatterProgress progress) {
        return sample(List.of(nominal), List.of(halfWidths), req, settings, progress).get(0);
    }

    /** Summary for one design, tolerances from {@code source} at the requirement's tolerance grade. */
    public static ScatterSummary summarise(Spring nominal, Requirement req, ToleranceSource source,
                                           ScatterSettings settings, ScatterProgress progress) {
        return summarise(List.of(nominal), req, source, settings, progress).get(0);
    }

    /**
     * Summaries for a shortlist, in its order, every design with the same seed. Progress counts over the whole list.
     */
    public static List<ScatterSummary> summarise(List<Spring> designs, Requirement req, ToleranceSource source,
                                                 ScatterSettings settings, ScatterProgress progress) {
        List<HalfWidths> widths = new ArrayList<>();
        for (Spring s : designs) {
            widths.add(source.halfWidths(s, req.spring().toleranceGrade()));
        }
        List<ScatterSamples> samples = sample(designs, widths, req, settings, progress);
        ScatterSummary[] out = new ScatterSummary[samples.size()];
        inParallel(out.length, i -> out[i] = samples.get(i).summary());
        return List.of(out);
    }

    /** Draws {@code settings.samples()} made springs of each design, all with the same deviations. */
    static List<ScatterSamples> sample(List<Spring> designs, List<HalfWidths> widths, Requirement req,
                                       ScatterSettings settings, ScatterProgress progress) {
        int designCount = designs.size();
        if (designCount == 0) {
            return List.of();
        }
        int n = settings.samples();
        SampleEvaluator[] evaluators = new SampleEvaluator[designCount];
        double[][][] values = new double[designCount][][];
        for (int i = 0; i < designCount; i++) {
            evaluators[i] = SampleEvaluator.of(designs.get(i), widths.get(i), req, settings);
            values[i] = new double[evaluators[i].figures().size()][n];
        }
        int[] ok = new int[designCount];
        int[] invalid = new int[designCount];
        Reporter reporter = new Reporter(progress, (long) designCount * n);
        DeviationSampler sampler = new DeviationSampler(settings.seed());
        int blockSize = Math.min(n, BLOCK);
        double[] z = new double[blockSize * DeviationSampler.DRAWS];
        for (int start = 0; start < n; start += blockSize) {
            new SampleBlock(evaluators, values, z, start, Math.min(blockSize, n - start), ok, invalid, reporter)
                    .run(sampler);
        }
        List<ScatterSamples> out = new ArrayList<>();
        for (int i = 0; i < designCount; i++) {
            out.add(new ScatterSamples(n, settings.seed(), ok[i], invalid[i], evaluators[i].figures(), values[i]));
        }
        return out;
    }

    /** Runs {@code body} for 0 ≤ i &lt; {@code count} on the common pool's threads, each taking the next i in turn. */
    private static void inParallel(int count, java.util.function.IntConsumer body) {
        AtomicInteger next = new AtomicInteger();
        int threads = Math.max(1, Math.min(count, ForkJoinPool.getCommonPoolParallelism() + 1));
        IntStream.range(0, threads).parallel().forEach(w -> {
            for (int i = next.getAndIncrement(); i < count; i = next.getAndIncrement()) {
                body.accept(i);
            }
        });
    }

    /** Sums progress over the tasks and passes it on, one call at a time, so the counts only ever grow. */
    static final class Reporter {
        private final ScatterProgress progress;
        private final long total;
        private long done;

        Reporter(ScatterProgress progress, long total) {
            this.progress = progress;
            this.total = total;
        }

        synchronized void advanced(long step) {
            done += step;
            progress.advanced(done, total);
        }
    }

    /**
     * The reference path, one design: each made spring is built ({@link SpringMaker}) and evaluated in full
     * ({@link Installation}, which runs {@code DesignEvaluator.evaluate}), its deviations drawn in turn. Slow; kept as
     * the oracle that {@link SampleEvaluator} is tested against.
     */
    static ScatterSamples sampleByRecords(Spring nominal, Requirement req, HalfWidths halfWidths,
                                          ScatterSettings settings) {
        Installation installation = Installation.of(nominal, req, settings);
        SpringMaker maker = new SpringMaker(nominal, halfWidths);
        DeviationSampler sampler = new DeviationSampler(settings.seed());
        int n = settings.samples();
        int width = installation.figures().size();
        double[][] values = new double[width][n];
        double[] z = new double[DeviationSampler.DRAWS];
        double[] out = new double[width];
        int ok = 0;
        int invalid = 0;
        for (int i = 0; i < n; i++) {
            sampler.next(z);
            int outcome = byRecords(installation, maker, z, out);
            if (outcome == SampleEvaluator.INVALID) {
                invalid++;
            } else if (outcome == SampleEvaluator.MEETS) {
                ok++;
            }
            for (int j = 0; j < width; j++) {
                values[j][i] = out[j];
            }
        }
        return new ScatterSamples(n, settings.seed(), ok, invalid, installation.figures(), values);
    }

    /**
     * One made spring by the reference path: built by {@code maker}, worked by {@code installation}; a spring that
     * cannot exist, or whose evaluation throws, is {@link SampleEvaluator#INVALID} with NaN figures.
     */
    static int byRecords(Installation installation, SpringMaker maker, double[] z, double[] out) {
        try {
            return installation.run(maker.make(z), maker.freeLengthDeviation(z), out)
                    ? SampleEvaluator.MEETS : SampleEvaluator.FAILS;
        } catch (CoilwiseException e) {
            Arrays.fill(out, Double.NaN);
            return SampleEvaluator.INVALID;
        }
    }
}
