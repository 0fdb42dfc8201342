package dev.coilwise.report;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import dev.coilwise.dynamics.TimeHistory;
import org.junit.jupiter.api.Test;

/**
 * A long time history is thinned to at most {@link ShortlistJson#HISTORY_ROWS} rows, keeping its first and last rows
 * and the rows of the largest travel and force. The history here is made up (two sine waves whose peaks fall between
 * the evenly spaced rows), to exercise the thinning, not the mechanics.
 */
class ShortlistJsonThinningTest {
    @Test
    void aLongHistoryKeepsItsEndsAndBothPeaks() {
        int n = 5003;
        double[] t = new double[n];
        double[] x = new double[n];
        double[] v = new double[n];
        double[] f = new double[n];
        double[] s = new double[n];
        int peakX = 1234;
        int peakF = 3777;
        for (int i = 0; i < n; i++) {
            t[i] = i * 1e-5;
            x[i] = 0.02 * Math.sin(Math.PI / 2 * i / peakX);
            f[i] = 500 * Math.exp(-Math.pow((i - peakF) / 300.0, 2));
        }
        JsonNode h = ShortlistJson.history(new TimeHistory(t, x, v, f, s));
        JsonNode time = h.get("time_ms");
        assertThat(time.size()).isLessThanOrEqualTo(ShortlistJson.HISTORY_ROWS).isGreaterThan(ShortlistJson.HISTORY_ROWS / 2);
        assertThat(h.get("load_position_mm").size()).isEqualTo(time.size());
        assertThat(h.get("top_force_N").size()).isEqualTo(time.size());
        assertThat(time.get(0).asDouble()).isEqualTo(0);
        assertThat(time.get(time.size() - 1).asDouble()).isEqualTo(50.02);
        assertThat(contains(time, 12.34)).as("the row of the largest travel").isTrue();
        assertThat(contains(time, 37.77)).as("the row of the largest force").isTrue();
        assertThat(max(h.get("top_force_N"))).isEqualTo(500);
        assertThat(max(h.get("load_position_mm"))).isEqualTo(20);
    }

    @Test
    void aShortHistoryIsKeptWhole() {
        double[] t = {0, 0.001, 0.002};
        double[] x = {0, 0.01, 0.005};
        JsonNode h = ShortlistJson.history(new TimeHistory(t, x, new double[3], new double[] {0, 100, 50},
                new double[3]));
        assertThat(h.get("time_ms").toString()).isEqualTo("[0,1,2]");
        assertThat(h.get("load_position_mm").toString()).isEqualTo("[0,10,5]");
    }

    private static boolean contains(JsonNode arr, double v) {
        for (JsonNode e : arr) {
            if (Math.abs(e.asDouble() - v) < 1e-9) {
                return true;
            }
        }
        return false;
    }

    private static double max(JsonNode arr) {
        double m = Double.NEGATIVE_INFINITY;
        for (JsonNode e : arr) {
            m = Math.max(m, e.asDouble());
        }
        return m;
    }
}
