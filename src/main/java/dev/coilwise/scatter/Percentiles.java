package dev.coilwise.scatter;

import org.apache.commons.math3.stat.descriptive.rank.Percentile;

/**
 * Percentiles by the R-7 rule (Hyndman &amp; Fan 1996, definition 7): position h = 1 + (n − 1)·p, estimate
 * x₍⌊h⌋₎ + (h − ⌊h⌋)·(x₍⌊h⌋+1₎ − x₍⌊h⌋₎), the order statistics counted from 1. The value is exactly that of Commons
 * Math's {@code Percentile} with {@code EstimationType.R_7} (the same position and the same arithmetic on the same
 * two order statistics), found faster for the tails the Monte Carlo reports: a percentile near 0 or 100 needs only
 * the few smallest or largest values, which one pass with a small heap finds without reordering the data.
 * {@code PercentilesTest} holds it to Commons Math.
 *
 * <p>The one case left to Commons Math: an order statistic equal to zero, since −0.0 and +0.0 compare equal and the
 * library's selection decides which of the two it returns.
 */
final class Percentiles {
    private Percentiles() {
    }

    /**
     * The R-7 percentile of {@code data}.
     *
     * @param data       values, no NaN, at least one; not modified
     * @param percentile p in (0, 100]
     */
    static double r7(double[] data, double percentile) {
        int n = data.length;
        if (n == 1) {
            return data[0];
        }
        double p = percentile / 100d;
        double pos = Double.compare(p, 0d) == 0 ? 0 : Double.compare(p, 1d) == 0 ? n : 1 + (n - 1) * p;
        double fpos = Math.floor(pos);
        int intPos = (int) fpos;
        double dif = pos - fpos;
        double lower;
        double upper;
        if (pos < 1) {
            lower = upper = pair(data, 0)[0];
        } else if (pos >= n) {
            lower = upper = pair(data, n - 2)[1];
        } else {
            double[] two = pair(data, intPos - 1);
            lower = two[0];
            upper = two[1];
        }
        if (lower == 0 || upper == 0) {
            return new Percentile().withEstimationType(Percentile.EstimationType.R_7).evaluate(data, percentile);
        }
        if (pos < 1 || pos >= n) {
            return lower;
        }
        return lower + dif * (upper - lower);
    }

    /** The order statistics r and r + 1 of {@code data} (0-based, r + 1 &lt; n), from the nearer end. */
    private static double[] pair(double[] data, int r) {
        int n = data.length;
        if (r + 2 <= n - r) {
            double[] two = smallest(data, r + 2, 1);
            return new double[] {two[1], two[0]};
        }
        double[] two = smallest(data, n - r, -1);
        return new double[] {-two[0], -two[1]};
    }

    /**
     * The largest and the second largest of the {@code m} smallest values of {@code sign}·data (m ≥ 2): a max-heap of
     * the m smallest seen so far, replaced at its top by any smaller value.
     */
    private static double[] smallest(double[] data, int m, double sign) {
        double[] heap = new double[m];
        for (int i = 0; i < m; i++) {
            heap[i] = sign * data[i];
        }
        for (int i = m / 2 - 1; i >= 0; i--) {
            siftDown(heap, i, m);
        }
        for (int i = m; i < data.length; i++) {
            double v = sign * data[i];
            if (v < heap[0]) {
                heap[0] = v;
                siftDown(heap, 0, m);
            }
        }
        double second = m == 2 ? heap[1] : Math.max(heap[1], heap[2]);
        return new double[] {heap[0], second};
    }

    private static void siftDown(double[] heap, int i, int m) {
        double v = heap[i];
        while (true) {
            int c = 2 * i + 1;
            if (c >= m) {
                break;
            }
            if (c + 1 < m && heap[c + 1] > heap[c]) {
                c++;
            }
            if (!(heap[c] > v)) {
                break;
            }
            heap[i] = heap[c];
            i = c;
        }
        heap[i] = v;
    }
}
