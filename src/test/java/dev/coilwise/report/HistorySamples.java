package dev.coilwise.report;

import dev.coilwise.dynamics.TimeHistory;

/**
 * Demo data for the writer tests: half a cycle of a 2 kg mass meeting a 5 kN/m massless spring at 1 m/s,
 * x = (v0/ω)·sin ωt, F = k·x. Only the writers' output format is checked against it.
 */
final class HistorySamples {
    private HistorySamples() {
    }

    static TimeHistory halfCycle(int rows) {
        double k = 5000;
        double m = 2;
        double v0 = 1;
        double w = Math.sqrt(k / m);
        double[] t = new double[rows];
        double[] x = new double[rows];
        double[] v = new double[rows];
        double[] f = new double[rows];
        double[] s = new double[rows];
        for (int i = 0; i < rows; i++) {
            t[i] = Math.PI / w * i / (rows - 1);
            x[i] = v0 / w * Math.sin(w * t[i]);
            v[i] = v0 * Math.cos(w * t[i]);
            f[i] = k * x[i];
            s[i] = 2.5e6 * f[i];
        }
        return new TimeHistory(t, x, v, f, s);
    }
}
