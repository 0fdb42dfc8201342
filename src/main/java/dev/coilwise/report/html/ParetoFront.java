package dev.coilwise.report.html;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.function.ToDoubleFunction;

/**
 * The non-dominated points of a set when both coordinates are to be kept small: a point is on the front when no
 * other point is at least as small in both and smaller in one (the usual definition of Pareto optimality).
 */
final class ParetoFront {
    private ParetoFront() {
    }

    /** The points on the front, by increasing x (and so decreasing y); of equal points the first is kept. */
    static <T> List<T> of(List<T> points, ToDoubleFunction<T> x, ToDoubleFunction<T> y) {
        List<T> sorted = new ArrayList<>(points);
        sorted.sort(Comparator.comparingDouble(x).thenComparingDouble(y));
        List<T> front = new ArrayList<>();
        double bestY = Double.POSITIVE_INFINITY;
        for (T p : sorted) {
            if (y.applyAsDouble(p) < bestY) {
                front.add(p);
                bestY = y.applyAsDouble(p);
            }
        }
        return front;
    }
}
