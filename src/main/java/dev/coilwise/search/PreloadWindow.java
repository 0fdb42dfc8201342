package dev.coilwise.search;

/**
 * Closed-form necessary conditions on the preload deflection u = L0 − pocket (m) of an arrest into a pocket, for one
 * cell (rate k, solid length Ls). With E = ½mv0², Fc the push and F0 = k·u, the massless balance
 * ½kx² + (F0 − Fc)x = E gives the working deflection x, and φ(X) = ½kX² + (F0 − Fc)X − E ≥ 0 holds exactly when
 * x ≤ X (φ is convex with φ(0) = −E ≤ 0). Hence:
 * <ul>
 *   <li>stroke, x ≤ s: u ≥ (E + Fc·s − ½ks²)/(k·s);</li>
 *   <li>peak force P = Fc + √(2kE + (F0 − Fc)²) ≤ Pmax (peak-force, deceleration and stress limits):
 *       |F0 − Fc| ≤ √((Pmax − Fc)² − 2kE);</li>
 *   <li>coil bind, u + x ≤ (pocket + u − Ls)/(1 + ξ): with X(u) = A − βu, A = (pocket − Ls)/(1 + ξ),
 *       β = ξ/(1 + ξ), the condition φ(X(u)) ≥ 0 is the quadratic
 *       kβ(β/2 − 1)·u² + (kA(1 − β) + Fc·β)·u + (½kA² − Fc·A − E) ≥ 0, concave for ξ &gt; 0 (u between its roots)
 *       and linear for ξ = 0; and X(u) ≥ 0;</li>
 *   <li>stress at solid (when it is a hard limit), k(L0 − Ls) ≤ F_allow: u ≤ F_allow/k − (pocket − Ls);</li>
 *   <li>free length at most Lmax: u ≤ Lmax − pocket;</li>
 *   <li>the pocket margin, u ≥ 0.</li>
 * </ul>
 * The caller widens the window by one grid step on each side, so rounding in these formulas never loses a design;
 * every design in the window is still evaluated in full.
 *
 * @param low  smallest admissible u, m (may be −∞)
 * @param high largest admissible u, m (may be +∞; below {@code low} when no preload works)
 */
record PreloadWindow(double low, double high) {

    /** No preload works. */
    static final PreloadWindow EMPTY = new PreloadWindow(Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY);

    /**
     * @param k           rate, N/m
     * @param ls          solid length, m
     * @param pocket      pocket length, m
     * @param energy      kinetic energy at contact E, J
     * @param push        push force Fc, N
     * @param stroke      stroke limit s, m
     * @param maxForce    the smallest cap on the peak force, N
     * @param xi          clash allowance ξ
     * @param solidForce  force at which the stress at solid reaches the allowable, N (+∞ when it is not hard)
     * @param maxFree     longest free length, m (+∞ when none)
     */
    static PreloadWindow of(double k, double ls, double pocket, double energy, double push, double stroke,
                            double maxForce, double xi, double solidForce, double maxFree) {
        double lo = 0;
        double hi = Math.min(maxFree - pocket, solidForce / k - (pocket - ls));
        lo = Math.max(lo, (energy + push * stroke - 0.5 * k * stroke * stroke) / (k * stroke));
        double r = maxForce - push;
        double w2 = r * r - 2 * k * energy;
        if (r < 0 || w2 < 0) {
            return EMPTY;
        }
        double w = Math.sqrt(w2);
        lo = Math.max(lo, (push - w) / k);
        hi = Math.min(hi, (push + w) / k);
        double a0 = (pocket - ls) / (1 + xi);
        if (xi == 0) {
            double b = k * a0;
            double c = 0.5 * k * a0 * a0 - push * a0 - energy;
            if (b <= 0) {
                return c >= 0 ? new PreloadWindow(lo, hi) : EMPTY;
            }
            lo = Math.max(lo, -c / b);
        } else {
            double beta = xi / (1 + xi);
            hi = Math.min(hi, a0 / beta);
            double qa = k * beta * (beta / 2 - 1);
            double qb = k * a0 * (1 - beta) + push * beta;
            double qc = 0.5 * k * a0 * a0 - push * a0 - energy;
            double disc = qb * qb - 4 * qa * qc;
            if (disc < -1e-9 * (qb * qb + Math.abs(4 * qa * qc))) {
                return EMPTY;
            }
            double q = -0.5 * (qb + Math.copySign(Math.sqrt(Math.max(0, disc)), qb));
            double r1 = q / qa;
            double r2 = q == 0 ? 0 : qc / q;
            lo = Math.max(lo, Math.min(r1, r2));
            hi = Math.min(hi, Math.max(r1, r2));
        }
        return new PreloadWindow(lo, hi);
    }

    /**
     * Whether some preload u ≥ 0 lets the cell meet the coil-bind rule at all (the other conditions left out):
     * the largest value of the coil-bind quadratic over 0 ≤ u ≤ A/β is not below zero, with a relative tolerance of
     * {@value #BIND_TOLERANCE} that leans towards yes. For ξ = 0 a free length long enough always works when
     * pocket &gt; Ls. Once it fails at some active-coil count it fails for every larger count at the same mean
     * diameter: the energy taken before bind, (T − u)(½k(T + u) − Fc) with T − u = X(u), only shrinks as k falls and
     * Ls grows.
     */
    static boolean bindPossible(double k, double ls, double pocket, double energy, double push, double xi) {
        double a0 = (pocket - ls) / (1 + xi);
        if (a0 < 0) {
            return false;
        }
        if (xi == 0) {
            return a0 > 0 || energy == 0;
        }
        double beta = xi / (1 + xi);
        double qa = k * beta * (beta / 2 - 1);
        double qb = k * a0 * (1 - beta) + push * beta;
        double qc = 0.5 * k * a0 * a0 - push * a0 - energy;
        double u = Math.min(a0 / beta, Math.max(0, -qb / (2 * qa)));
        double q = (qa * u + qb) * u + qc;
        double scale = Math.abs(qa) * u * u + Math.abs(qb) * u + 0.5 * k * a0 * a0 + Math.abs(push * a0) + energy;
        return q >= -BIND_TOLERANCE * scale;
    }

    /** Relative tolerance of {@link #bindPossible}. */
    static final double BIND_TOLERANCE = 1e-6;
}
