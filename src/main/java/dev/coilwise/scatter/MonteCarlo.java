package dev.coilwise.scatter;

import dev.coilwise.error.CoilwiseException;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Spring;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

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
 */
public final class MonteCarlo {
    /** Samples between progress calls. */
    public static final int PROGRESS_STEP = 500;

    private MonteCarlo() {
    }

    /** Draws {@code settings.samples()} made springs of one design. */
    public static ScatterSamples sample(Spring nominal, Requirement req, HalfWidths halfWidths, ScatterSettings settings,
                                        ScatterProgress progress) {
        return sample(nominal, req, halfWidths, settings, progress, 0, settings.samples());
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
        long total = (long) designs.size() * settings.samples();
        java.util.concurrent.atomic.AtomicLong done = new java.util.concurrent.atomic.AtomicLong();
        // Designs are independent and each has its own seeded generator, so sampling them in parallel gives the same
        // result as in sequence; progress is summed over the designs as they go.
        return java.util.stream.IntStream.range(0, designs.size()).parallel().mapToObj(i -> {
            Spring s = designs.get(i);
            HalfWidths h = source.halfWidths(s, req.spring().toleranceGrade());
            long[] seen = {0};
            ScatterProgress mine = (d, t) -> {
                long step = d - seen[0];
                seen[0] = d;
                progress.advanced(done.addAndGet(step), total);
            };
            return sample(s, req, h, settings, mine, 0, settings.samples()).summary();
        }).toList();
    }

    private static ScatterSamples sample(Spring nominal, Requirement req, HalfWidths halfWidths,
                                         ScatterSettings settings, ScatterProgress progress, long offset, long total) {
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
            boolean good;
            try {
                good = installation.run(maker.make(z), maker.freeLengthDeviation(z), out);
            } catch (CoilwiseException e) {
                good = false;
                invalid++;
                Arrays.fill(out, Double.NaN);
            }
            if (good) {
                ok++;
            }
            for (int j = 0; j < width; j++) {
                values[j][i] = out[j];
            }
            if ((i + 1) % PROGRESS_STEP == 0 && i + 1 < n) {
                progress.advanced(offset + i + 1, total);
            }
        }
        progress.advanced(offset + n, total);
        return new ScatterSamples(n, settings.seed(), ok, invalid, installation.figures(), values);
    }
}
