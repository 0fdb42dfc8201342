package dev.coilwise.report.html;

import dev.coilwise.error.BadInputException;
import dev.coilwise.error.Message;
import java.util.Arrays;

/**
 * A simulated time history of one design, as saved under {@code designs[i].simulation.history} (thinned for charts):
 * equal-length columns {@code time_ms}, {@code load_position_mm} (position of the load's contact face from the
 * spring's free-length top, towards the base) and {@code top_force_N} (force between spring and load). SI inside;
 * arrays copied in and out.
 *
 * @param time     s
 * @param travel   m
 * @param force    N
 */
public record TimeSeries(double[] time, double[] travel, double[] force) {
    public TimeSeries {
        if (travel.length != time.length || force.length != time.length) {
            throw new IllegalArgumentException("time history columns differ in length");
        }
        time = time.clone();
        travel = travel.clone();
        force = force.clone();
    }

    @Override
    public double[] time() {
        return time.clone();
    }

    @Override
    public double[] travel() {
        return travel.clone();
    }

    @Override
    public double[] force() {
        return force.clone();
    }

    public int size() {
        return time.length;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof TimeSeries t && Arrays.equals(time, t.time) && Arrays.equals(travel, t.travel)
                && Arrays.equals(force, t.force);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(time) + Arrays.hashCode(force);
    }

    @Override
    public String toString() {
        return "TimeSeries[" + size() + " rows]";
    }

    static TimeSeries from(JsonIn h) {
        double[] t = java.util.Arrays.stream(h.numbers("time_ms")).map(v -> v * 1e-3).toArray();
        double[] x = h.numbers("load_position_mm");
        double[] f = h.numbers("top_force_N");
        if (x.length != t.length || f.length != t.length) {
            throw BadInputException.of(Message.SAVED_FIELD, h.path(), "columns of " + t.length + ", " + x.length
                    + " and " + f.length + " rows", "time_ms, load_position_mm and top_force_N of equal length");
        }
        return new TimeSeries(t, Arrays.stream(x).map(v -> v * 1e-3).toArray(), f);
    }
}
