package dev.coilwise.dynamics;

import java.util.Arrays;

/**
 * Time history of one simulation, sampled at a fixed interval plus the final instant. SI throughout. Arrays are
 * copied on the way in and on the way out.
 *
 * @param time              s, from first contact (arrest) or release (launch), non-decreasing
 * @param loadPosition      position of the load's contact face, m towards the base from the spring's free-length
 *                          top (the compression of the spring's top while the load presses on it; negative above it)
 * @param loadSpeed         speed of the load, m/s, positive towards the base
 * @param topForce          compressive force in the top element, the force between spring and load, N
 * @param peakElementStress largest corrected shear stress of any element at that instant, Pa
 */
public record TimeHistory(double[] time, double[] loadPosition, double[] loadSpeed, double[] topForce,
                          double[] peakElementStress) {

    public TimeHistory {
        int n = time.length;
        if (loadPosition.length != n || loadSpeed.length != n || topForce.length != n
                || peakElementStress.length != n) {
            throw new IllegalArgumentException("time history columns differ in length");
        }
        for (int i = 1; i < n; i++) {
            if (!(time[i] >= time[i - 1])) {
                throw new IllegalArgumentException("time history times must not decrease, row " + i);
            }
        }
        time = time.clone();
        loadPosition = loadPosition.clone();
        loadSpeed = loadSpeed.clone();
        topForce = topForce.clone();
        peakElementStress = peakElementStress.clone();
    }

    /** A history with no rows (the simulation was run without keeping one). */
    public static TimeHistory empty() {
        return new TimeHistory(new double[0], new double[0], new double[0], new double[0], new double[0]);
    }

    /** Number of rows. */
    public int size() {
        return time.length;
    }

    public boolean isEmpty() {
        return time.length == 0;
    }

    @Override
    public double[] time() {
        return time.clone();
    }

    @Override
    public double[] loadPosition() {
        return loadPosition.clone();
    }

    @Override
    public double[] loadSpeed() {
        return loadSpeed.clone();
    }

    @Override
    public double[] topForce() {
        return topForce.clone();
    }

    @Override
    public double[] peakElementStress() {
        return peakElementStress.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof TimeHistory h && Arrays.equals(time, h.time) && Arrays.equals(loadPosition, h.loadPosition)
                && Arrays.equals(loadSpeed, h.loadSpeed) && Arrays.equals(topForce, h.topForce)
                && Arrays.equals(peakElementStress, h.peakElementStress);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(time) * 31 + Arrays.hashCode(topForce);
    }

    @Override
    public String toString() {
        return "TimeHistory[" + size() + " rows]";
    }

    /** Collects rows; used by the simulator. */
    static final class Builder {
        private double[][] cols = new double[5][64];
        private int size;

        void add(double t, double position, double speed, double force, double stress) {
            if (size == cols[0].length) {
                for (int c = 0; c < cols.length; c++) {
                    cols[c] = Arrays.copyOf(cols[c], 2 * size);
                }
            }
            if (size > 0 && t <= cols[0][size - 1]) {
                return;
            }
            double[] row = {t, position, speed, force, stress};
            for (int c = 0; c < cols.length; c++) {
                cols[c][size] = row[c];
            }
            size++;
        }

        TimeHistory build() {
            return new TimeHistory(Arrays.copyOf(cols[0], size), Arrays.copyOf(cols[1], size),
                    Arrays.copyOf(cols[2], size), Arrays.copyOf(cols[3], size), Arrays.copyOf(cols[4], size));
        }
    }
}
