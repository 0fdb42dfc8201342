package dev.coilwise.scatter;

import java.util.Arrays;
import org.apache.commons.math3.stat.descriptive.rank.Percentile;

/**
 * Percentiles by the R-7 rule (Hyndman &amp; Fan 1996, definition 7): position h = 1 + (n − 1)·p, estimate
 * x₍⌊h⌋₎ + (h − ⌊h⌋)·(x₍⌊h⌋+1₎ − x₍⌊h⌋₎), the order statistics counted from 1. The values are exactly those of
 * Commons Math's {@code Percentile} with {@code EstimationType.R_7} (the same position and the same arithmetic on the
 * same two order statistics), found faster for the tails the Monte Carlo reports: a percentile near 0 or 100 needs
 * only the few smallest or largest values, which one pass with two small heaps finds without reordering the data.
 * {@code PercentilesTest} holds it to Commons Math.
 *
 * <p>The one case left to Commons Math: an order statistic equal to zero, since −0.0 and +0.0 compare equal and the
 * library's selection decides which of the two it returns.
 */
final class Percentiles {
    private Percentiles() {
    }

    /**
     * The R-7 percentiles of {@code data}, in the order asked.
     *
     * @param data        values, no NaN, at least one; not modified
     * @param percentiles each p in (0, 100]
     */
    static double[] r7(double[] data, double... percentiles) {
        int n = data.length;
        int k = percentiles.length;
        double[] pos = new double[k];
        int[] lowerIndex = new int[k];
        int[] upperIndex = new int[k];
        int smallest = 0;
        int largest = 0;
        for (int i = 0; i < k; i++) {
            double p = percentiles[i] / 100d;
            pos[i] = Double.compare(p, 0d) == 0 ? 0 : Double.compare(p, 1d) == 0 ? n : 1 + (n - 1) * p;
            int intPos = (int) Math.floor(pos[i]);
            lowerIndex[i] = pos[i] < 1 ? 0 : pos[i] >= n ? n - 1 : intPos - 1;
            upperIndex[i] = pos[i] < 1 ? 0 : pos[i] >= n ? n - 1 : intPos;
            for (int j : new int[] {lowerIndex[i], upperIndex[i]}) {
                if (j + 1 <= n - j) {
                    smallest = Math.max(smallest, j + 1);
                } else {
                    largest = Math.max(largest, n - j);
                }
            }
        }
        double[] low = new double[smallest];
        double[] high = new double[largest];
        tails(data, low, high);
        double[] out = new double[k];
        for (int i = 0; i < k; i++) {
            double lower = orderStatistic(lowerIndex[i], n, low, high);
            double upper = orderStatistic(upperIndex[i], n, low, high);
            if (lower == 0 || upper == 0) {
                out[i] = new Percentile().withEstimationType(Percentile.EstimationType.R_7)
                        .evaluate(data, percentiles[i]);
            } else if (n == 1 || pos[i] < 1 || pos[i] >= n) {
                out[i] = lower;
            } else {
                double dif = pos[i] - Math.floor(pos[i]);
                out[i] = lower + dif * (upper - lower);
            }
        }
        return out;
    }

    /** The order statistic {@code j} (0-based) from the tails: {@code low} ascending, {@code high} descending. */
    private static double orderStatistic(int j, int n, double[] low, double[] high) {
        return j < low.length ? low[j] : high[n - 1 - j];
    }

    /**
     * Fills {@code low} with the smallest values of {@code data}, ascending, and {@code high} with the largest,
     * descending, in one pass: each is a heap of the values kept so far (largest of the small ones, smallest of the
     * large ones on top), whose top any better value replaces; sorted at the end.
     */
    private static void tails(double[] data, double[] low, double[] high) {
        int l = low.length;
        int h = high.length;
        System.arraycopy(data, 0, low, 0, l);
        System.arraycopy(data, 0, high, 0, h);
        for (int i = l / 2 - 1; i >= 0; i--) {
            siftDown(low, i, l, 1);
        }
        for (int i = h / 2 - 1; i >= 0; i--) {
            siftDown(high, i, h, -1);
        }
        double lowTop = l == 0 ? Double.NEGATIVE_INFINITY : low[0];
        double highTop = h == 0 ? Double.POSITIVE_INFINITY : high[0];
        for (int i = Math.min(l, h); i < data.length; i++) {
            double v = data[i];
            if (v < lowTop && i >= l) {
                low[0] = v;
                siftDown(low, 0, l, 1);
                lowTop = low[0];
            }
            if (v > highTop && i >= h) {
                high[0] = v;
                siftDown(high, 0, h, -1);
                highTop = high[0];
            }
        }
        Arrays.sort(low);
        Arrays.sort(high);
        for (int i = 0, j = h - 1; i < j; i++, j--) {
            double t = high[i];
            high[i] = high[j];
            high[j] = t;
        }
    }

    /** Restores the heap below {@code i}: a max-heap for {@code order} 1, a min-heap for −1. */
    private static void siftDown(double[] heap, int i, int m, int order) {
        double v = heap[i];
        while (true) {
            int c = 2 * i + 1;
            if (c >= m) {
                break;
            }
            if (c + 1 < m && (order > 0 ? heap[c + 1] > heap[c] : heap[c + 1] < heap[c])) {
                c++;
            }
            if (!(order > 0 ? heap[c] > v : heap[c] < v)) {
                break;
            }
            heap[i] = heap[c];
            i = c;
        }
        heap[i] = v;
    }
}
