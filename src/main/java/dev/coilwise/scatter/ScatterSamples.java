package dev.coilwise.scatter;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.stat.descriptive.DescriptiveStatistics;

/**
 * Every made spring of one Monte Carlo run: its working figures (SI) and how many met the requirement. A made spring
 * whose deviations give no valid spring (far outside any real tolerance) counts as failing and has NaN figures,
 * which the statistics leave out.
 */
public final class ScatterSamples {
    /** Lower and upper percentiles of the summary: 1 and 99. */
    public static final double LOW_PERCENTILE = 1;
    public static final double HIGH_PERCENTILE = 99;

    private final int samples;
    private final long seed;
    private final int ok;
    private final int invalid;
    private final List<Figure> figures;
    private final double[][] values;

    ScatterSamples(int samples, long seed, int ok, int invalid, List<Figure> figures, double[][] values) {
        this.samples = samples;
        this.seed = seed;
        this.ok = ok;
        this.invalid = invalid;
        this.figures = List.copyOf(figures);
        this.values = values;
    }

    public int samples() {
        return samples;
    }

    public long seed() {
        return seed;
    }

    /** Made springs that could not exist (counted as failing). */
    public int invalid() {
        return invalid;
    }

    /** Share of made springs meeting the requirement. */
    public double probabilityOk() {
        return (double) ok / samples;
    }

    /** The figures collected, in report order. */
    public List<Figure> figures() {
        return figures;
    }

    /** The SI values of one figure over the valid made springs, in draw order. */
    public double[] values(Figure f) {
        int i = figures.indexOf(f);
        if (i < 0) {
            throw new IllegalArgumentException("figure " + f.key() + " is not collected for this job; collected: " + figures);
        }
        double[] v = valid(values[i]);
        return v == values[i] ? v.clone() : v;
    }

    /** {@code all} without its NaNs, in order: {@code all} itself when it has none. */
    private static double[] valid(double[] all) {
        int count = 0;
        for (double v : all) {
            if (!Double.isNaN(v)) {
                count++;
            }
        }
        if (count == all.length) {
            return all;
        }
        double[] out = new double[count];
        int j = 0;
        for (double v : all) {
            if (!Double.isNaN(v)) {
                out[j++] = v;
            }
        }
        return out;
    }

    /** Mean, standard deviation and the rest of one figure (SI), Commons Math. */
    public DescriptiveStatistics statistics(Figure f) {
        return new DescriptiveStatistics(values(f));
    }

    /**
     * The summary: percentiles by the R-7 rule (linear between order statistics; Hyndman &amp; Fan 1996, definition 7,
     * as in Commons Math {@code Percentile.EstimationType.R_7}, whose values {@link Percentiles} gives exactly), in the
     * unit of each figure's key.
     */
    public ScatterSummary summary() {
        Map<String, Double> p01 = new LinkedHashMap<>();
        Map<String, Double> p99 = new LinkedHashMap<>();
        for (int i = 0; i < figures.size(); i++) {
            Figure f = figures.get(i);
            double[] v = valid(values[i]); // not modified
            if (v.length == 0) {
                p01.put(f.key(), Double.NaN);
                p99.put(f.key(), Double.NaN);
                continue;
            }
            double[] p = Percentiles.r7(v, LOW_PERCENTILE, HIGH_PERCENTILE);
            p01.put(f.key(), f.display(p[0]));
            p99.put(f.key(), f.display(p[1]));
        }
        return new ScatterSummary(samples, seed, probabilityOk(), p01, p99);
    }
}
