package dev.coilwise.dynamics;

import java.util.Arrays;
import java.util.List;
import org.apache.commons.math3.ode.sampling.AbstractStepInterpolator;
import org.apache.commons.math3.ode.sampling.StepHandler;
import org.apache.commons.math3.ode.sampling.StepInterpolator;

/**
 * Largest values over the run of "gauges": differences of two positions of the state (an element's closure, the load
 * position), each counted towards one group whose largest value is reported.
 *
 * <p>Within a step, a gauge φ is modelled by the quintic Hermite polynomial that matches φ, φ' and φ'' at both ends
 * of the step, read through the step interpolator at each end (positions, speeds and their derivatives; a step's end
 * serves as the next one's start unless an event cut it short). At the ends of an integrator step these are the
 * integrator's own state and the equations' derivatives there (the Dormand–Prince dense output reproduces both); at
 * an event inside a step they are the dense output's values. The
 * polynomial's error is at most h⁶·max|φ⁽⁶⁾|/46080 (the Hermite interpolation error (x − x₀)³(x − x₁)³·f⁽⁶⁾(ξ)/6!,
 * Burden &amp; Faires, <i>Numerical Analysis</i>, Sec. 3.4, from memory), for a swing of amplitude A and angular
 * frequency ω at most A·(ω·h)⁶/46080. The modes that carry the motion are finely resolved; the chain's fastest mode
 * gets ω·h ≈ 1.5 in an arrest (up to 4 in a launch), where its share of the motion is small. PeakTrackerTest holds the
 * peaks to 1e-6 of a dense search of the integrator's own dense output.
 *
 * <p>The polynomial is written in Bernstein form, whose control points bound it from above (convex hull property):
 * a step whose bound does not beat the group's largest value so far is passed over without further work. Otherwise
 * the polynomial's derivative is scanned at {@value #SCAN_POINTS} points and each maximum found is refined by
 * Newton's method on the polynomial. The gauges are computed from positions alone, so they hold on interpolated
 * states after the switches have moved on (see {@link TopFace}).
 */
final class PeakTracker implements StepHandler {
    /** Points at which the derivative of a step's polynomial is scanned for a sign change. */
    static final int SCAN_POINTS = 16;
    /** Iterations allowed to refine one maximum: Newton steps kept inside a shrinking bracket, else bisection. */
    static final int REFINE_ITERATIONS = 30;
    /** A maximum is refined until its place within the step is known to this fraction of the step. */
    static final double REFINE_TOLERANCE = 1e-9;

    /**
     * φ(y) = y[plus] − y[minus] + offset, m; an index of −1 leaves its term out.
     *
     * @param group the group (0, 1, ...) whose largest value φ counts towards
     */
    record Gauge(int plus, int minus, double offset, int group) {
        Gauge {
            if (plus < -1 || minus < -1 || group < 0) {
                throw new IllegalArgumentException("bad gauge " + plus + ", " + minus + ", group " + group);
            }
        }

        /** φ(y), m. */
        double value(double[] y) {
            return at(y, 0) + offset;
        }

        /** φ', m/s, from a state (speeds sit {@code shift} = N + 1 places after their positions). */
        double rate(double[] y, int shift) {
            return at(y, shift);
        }

        /** φ'', m/s², from the derivatives of a state. */
        double acceleration(double[] yDot, int shift) {
            return at(yDot, shift);
        }

        private double at(double[] y, int shift) {
            double v = plus >= 0 ? y[plus + shift] : 0;
            return minus >= 0 ? v - y[minus + shift] : v;
        }
    }

    private final int speeds;
    private final Gauge[] gauges;
    private final double[] max;
    private double[] y0;
    private double[] a0;
    private double[] y1;
    private double[] a1;
    /** Time of the state held in y0 and a0 for the next step, s, or NaN. */
    private double start = Double.NaN;

    /**
     * @param masses N; speeds sit N + 1 places after their positions (layout in {@link TopFace})
     * @param groups number of groups
     */
    PeakTracker(int masses, List<Gauge> gauges, int groups) {
        this.speeds = masses + 1;
        this.gauges = gauges.toArray(new Gauge[0]);
        this.max = new double[groups];
        Arrays.fill(max, Double.NEGATIVE_INFINITY);
        int dim = 2 * speeds;
        this.y0 = new double[dim];
        this.a0 = new double[dim];
        this.y1 = new double[dim];
        this.a1 = new double[dim];
    }

    /** The largest value of any gauge of group {@code g} over the run, m (−∞ for a group without gauges). */
    double max(int g) {
        return max[g];
    }

    @Override
    public void init(double t0, double[] y, double t) {
        for (Gauge g : gauges) {
            max[g.group()] = Math.max(max[g.group()], g.value(y));
        }
    }

    @Override
    public void handleStep(StepInterpolator interpolator, boolean isLast) {
        double t0 = interpolator.getPreviousTime();
        double t1 = interpolator.getCurrentTime();
        double h = t1 - t0;
        if (!(h > 0)) {
            return;
        }
        if (!(t0 == start)) {
            read(interpolator, t0, y0, a0);
        }
        read(interpolator, t1, y1, a1);
        for (Gauge g : gauges) {
            double f0 = g.value(y0);
            double f1 = g.value(y1);
            double d0 = h * g.rate(y0, speeds);
            double d1 = h * g.rate(y1, speeds);
            double c0 = h * h * g.acceleration(a0, speeds);
            double c1 = h * h * g.acceleration(a1, speeds);
            int k = g.group();
            max[k] = Math.max(max[k], Math.max(f0, f1));
            // Bernstein control points of the quintic Hermite polynomial on s in [0, 1] (the end ones are f0, f1).
            double bound = Math.max(Math.max(f0 + d0 / 5, f0 + 2 * d0 / 5 + c0 / 20),
                    Math.max(f1 - d1 / 5, f1 - 2 * d1 / 5 + c1 / 20));
            if (bound > max[k]) {
                max[k] = Math.max(max[k], interiorMax(f0, f1, d0, d1, c0, c1));
            }
        }
        keepEnd(interpolator, t1);
    }

    /**
     * Keeps the step's end as the next step's start, as a Runge–Kutta step with its first stage the same as the last
     * (Dormand–Prince) starts from exactly that state and derivative; unless an event cut the step short, after which
     * the derivatives may jump, or the interpolator does not say.
     */
    private void keepEnd(StepInterpolator interpolator, double t1) {
        boolean cut = !(interpolator instanceof AbstractStepInterpolator a) || t1 != a.getGlobalCurrentTime();
        start = cut ? Double.NaN : t1;
        double[] swap = y0;
        y0 = y1;
        y1 = swap;
        swap = a0;
        a0 = a1;
        a1 = swap;
    }

    /**
     * Copies state and derivatives at {@code t}. The interpolator keeps what it computed last, so when it already
     * stands at {@code t} (the event check has just read the step's end) nothing is computed again.
     */
    private static void read(StepInterpolator interpolator, double t, double[] y, double[] yDot) {
        if (!(interpolator.getInterpolatedTime() == t)) {
            interpolator.setInterpolatedTime(t);
        }
        System.arraycopy(interpolator.getInterpolatedState(), 0, y, 0, y.length);
        System.arraycopy(interpolator.getInterpolatedDerivatives(), 0, yDot, 0, yDot.length);
    }

    /**
     * Largest interior maximum of the quintic p with p(0) = f0, p(1) = f1, p'(0) = d0, p'(1) = d1, p''(0) = c0,
     * p''(1) = c1, or −∞ if the scan finds none.
     */
    static double interiorMax(double f0, double f1, double d0, double d1, double c0, double c1) {
        double e = f1 - f0 - d0 - c0 / 2;
        double e1 = d1 - d0 - c0;
        double e2 = c1 - c0;
        double[] p = {f0, d0, c0 / 2, 10 * e - 4 * e1 + e2 / 2, -15 * e + 7 * e1 - e2, 6 * e - 3 * e1 + e2 / 2};
        double best = Double.NEGATIVE_INFINITY;
        double sPrev = 0;
        double dPrev = d0;
        for (int i = 1; i <= SCAN_POINTS; i++) {
            double s = (double) i / SCAN_POINTS;
            double d = slope(p, s);
            if (dPrev > 0 && d <= 0) {
                best = Math.max(best, value(p, refine(p, sPrev, s)));
            }
            sPrev = s;
            dPrev = d;
        }
        return best;
    }

    /** The root of p' in [lo, hi], where p' falls from positive to non-positive: Newton's method kept in a bracket. */
    private static double refine(double[] p, double lo, double hi) {
        double s = (lo + hi) / 2;
        for (int i = 0; i < REFINE_ITERATIONS; i++) {
            double d = slope(p, s);
            if (d > 0) {
                lo = s;
            } else {
                hi = s;
            }
            double curvature = 2 * p[2] + s * (6 * p[3] + s * (12 * p[4] + s * 20 * p[5]));
            double next = curvature < 0 ? s - d / curvature : Double.NaN;
            if (!(next > lo && next < hi)) {
                next = (lo + hi) / 2;
            }
            if (Math.abs(next - s) <= REFINE_TOLERANCE || hi - lo <= REFINE_TOLERANCE) {
                return next;
            }
            s = next;
        }
        return s;
    }

    private static double value(double[] p, double s) {
        return p[0] + s * (p[1] + s * (p[2] + s * (p[3] + s * (p[4] + s * p[5]))));
    }

    private static double slope(double[] p, double s) {
        return p[1] + s * (2 * p[2] + s * (3 * p[3] + s * (4 * p[4] + s * 5 * p[5])));
    }
}
