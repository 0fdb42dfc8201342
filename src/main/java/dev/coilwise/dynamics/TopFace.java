package dev.coilwise.dynamics;

/**
 * The massless top end face of the chain and where every element's ends are. The face is held by exactly one of:
 * the load pressed onto it, the end stop of a preloaded pocket, or nothing (then the top element is unloaded and the
 * face follows the top mass). The two flags are switched only by {@link ContactDetector} and {@link SeatDetector} at
 * the roots of their switching functions, so within one integration step the equations stay smooth.
 *
 * <p>State layout, N masses: y[0..N−1] coil positions, y[N] load position, y[N+1..2N] coil speeds, y[2N+1] load
 * speed; positions in m towards the base from free length, speeds in m/s.
 */
final class TopFace {
    private final int n;
    private final double stop;
    private final boolean loadPresent;
    private boolean loadOn;
    private boolean onStop;

    /**
     * @param masses      N
     * @param stop        position of the end stop, m, or −∞ without one
     * @param loadPresent whether a load or payload exists
     */
    TopFace(int masses, double stop, boolean loadPresent) {
        this.n = masses;
        this.stop = stop;
        this.loadPresent = loadPresent;
    }

    /** Sets both flags from the geometry of the state {@code y} (used once, at the start). */
    void start(double[] y, boolean loadOnAtStart) {
        loadOn = loadPresent && loadOnAtStart;
        onStop = y[n - 1] < stop;
    }

    boolean loadOn() {
        return loadOn;
    }

    void setLoadOn(boolean on) {
        loadOn = loadPresent && on;
    }

    void setOnStop(boolean on) {
        onStop = on;
    }

    boolean hasStop() {
        return stop != Double.NEGATIVE_INFINITY;
    }

    /** Position of the end stop, m, or −∞ without one. */
    double stop() {
        return stop;
    }

    /** Whether a load or payload exists. */
    boolean loadPresent() {
        return loadPresent;
    }

    /** Position of the face under the current flags, m. */
    double position(double[] y) {
        if (loadOn) {
            return y[n];
        }
        return onStop ? stop : y[n - 1];
    }

    /**
     * Position of the face from the geometry alone, max(u_N, stop, u_L), m: equal to {@link #position} whenever the
     * flags are up to date, and usable on interpolated states after the flags have moved on.
     */
    double geometricPosition(double[] y) {
        double p = Math.max(y[n - 1], stop);
        return loadPresent ? Math.max(p, y[n]) : p;
    }

    /** Compression of element j (1..N+1) under the current flags, m. */
    double deformation(int j, double[] y) {
        if (j <= n) {
            return y[j - 1] - (j > 1 ? y[j - 2] : 0);
        }
        return position(y) - y[n - 1];
    }

    /** Compression of element j (1..N+1) from the geometry alone, m. */
    double geometricDeformation(int j, double[] y) {
        if (j <= n) {
            return y[j - 1] - (j > 1 ? y[j - 2] : 0);
        }
        return geometricPosition(y) - y[n - 1];
    }

    /** Switching function of contact: u_L − max(u_N, stop), m; positive while the load presses on the face. */
    double contactGap(double[] y) {
        return y[n] - Math.max(y[n - 1], stop);
    }

    /** Switching function of the stop: u_N − stop, m; negative while the stop holds the face. */
    double seatGap(double[] y) {
        return y[n - 1] - stop;
    }

    /** Applies a compressive force of the top element: on mass N towards the base, on the load (if on) away. */
    void applyTopForce(double force, double[] f) {
        f[n - 1] += force;
        if (loadOn) {
            f[n] -= force;
        }
    }

    /** Applies a compressive force of element j (1..N) to its two end masses. */
    static void applyElementForce(int j, double force, double[] f) {
        f[j - 1] -= force;
        if (j > 1) {
            f[j - 2] += force;
        }
    }
}
