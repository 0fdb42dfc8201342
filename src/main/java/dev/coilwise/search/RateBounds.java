package dev.coilwise.search;

import dev.coilwise.model.Arrest;
import dev.coilwise.model.Gravity;
import dev.coilwise.model.Launch;
import dev.coilwise.model.Requirement;

/**
 * Closed-form bounds on the spring rate that any feasible design at a given mean diameter must meet. They are
 * necessary conditions drawn from the massless energy balance, so the search may discard every rate outside them.
 *
 * <p>Arrest, with E = ½mv0² and Fc the push: the peak force is P = Fc + √(2kE + (F0 − Fc)²) ≥ Fc + √(2kE + n²),
 * n = min over admissible preloads of |F0 − Fc| (= |Fc| without a pocket, max(0, −Fc) with one); the peak-force,
 * deceleration and working-stress limits cap P, hence k from above. Without a pocket the stroke needs
 * ½ks² ≥ E + Fc·s, hence k from below; with one, see {@link #preloadedLow}. Launch, with b = m·g·sin θ, c = ½mv² and η: a spring mass only raises the
 * cocked compression, so the cocking force P ≥ (b + √(b² + 2ηkc))/η caps k from above and the stroke needs
 * ½ηks² ≥ bs + c, hence k from below.
 *
 * @param low  smallest admissible rate, N/m (0 when none)
 * @param high largest admissible rate, N/m (+∞ when none; negative when no rate can work)
 */
record RateBounds(double low, double high) {

    boolean empty() {
        return high < low || high < 0;
    }

    /**
     * @param maxForce the smallest of the peak-force limit, the deceleration limit as a force and the force that
     *                 reaches the allowable stress at this diameter, N
     */
    static RateBounds of(Requirement req, double maxForce) {
        double s = req.limits().stroke();
        if (req.job() instanceof Arrest a) {
            double e = a.kineticEnergy();
            double fc = a.pushForce();
            boolean pocket = req.envelope().pocketLength().isPresent();
            double n = pocket ? Math.max(0, -fc) : Math.abs(fc);
            double r = maxForce - fc;
            double high;
            if (r < 0 || r * r < n * n) {
                high = -1;
            } else {
                high = e > 0 ? (r * r - n * n) / (2 * e) : Double.POSITIVE_INFINITY;
            }
            double low = pocket ? preloadedLow(req, e, fc, s) : Math.max(0, 2 * (e + fc * s) / (s * s));
            return new RateBounds(low, high);
        }
        Launch l = (Launch) req.job();
        double eta = l.efficiency();
        double b = l.mass() * Gravity.STANDARD * Math.sin(l.angle());
        double v = l.requiredExitSpeed();
        double c = 0.5 * l.mass() * v * v;
        double q = eta * maxForce - b;
        double high = q < b ? -1 : (q * q - b * b) / (2 * eta * c);
        double low = 2 * (b * s + c) / (eta * s * s);
        return new RateBounds(low, high);
    }

    /**
     * Smallest rate for an arrest into a pocket, N/m (0 when none follows). The preload deflection u is at most
     * U = min(Lmax − pocket, pocket/ξ) (free-length limit; coil bind with x ≥ 0 and Ls ≥ 0 gives ξu ≤ pocket − Ls),
     * and the energy taken within the stroke is E + Fc·x = k(u·x + ½x²) with x ≤ s. For Fc ≥ 0 the ratio
     * (E + Fc·x)/(U·x + ½x²) falls as x grows, so k ≥ (E/s + Fc)/(U + s/2).
     */
    private static double preloadedLow(Requirement req, double e, double fc, double s) {
        if (fc < 0) {
            return 0;
        }
        double pocket = req.envelope().pocketLength().getAsDouble();
        double u = req.envelope().maxFreeLength().orElse(Double.POSITIVE_INFINITY) - pocket;
        double xi = req.spring().clashAllowance();
        if (xi > 0) {
            u = Math.min(u, pocket / xi);
        }
        return u < Double.POSITIVE_INFINITY && u >= 0 ? (e / s + fc) / (u + s / 2) : 0;
    }
}
