package dev.coilwise.mechanics;

import dev.coilwise.error.BadInputException;
import dev.coilwise.error.Check;
import dev.coilwise.model.Spring;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Cycle life of a helical compression spring working between two forces. Pure and thread-safe.
 *
 * <p>Working stresses: τ_min and τ_max are the Bergsträsser-corrected stresses at the smallest and largest working
 * force (arrest: the preload at the installed length, or zero without a pocket, to the peak; launch: zero at free
 * length to the cocked force); τ_a = (τ_max − τ_min)/2 and τ_m = (τ_max + τ_min)/2, both corrected as in Shigley's
 * MED 9th ed., Sec. 10-9 (from memory).
 *
 * <p>How the required life N maps to the checks:
 * <ul>
 *   <li>N &lt; 10⁴ ({@link #STATIC_BELOW}): static service; n = static allowable / τ_max, criterion {@code static}.</li>
 *   <li>10⁴ ≤ N &lt; 10⁷: the {@link CyclicStressTable} fraction of S_ut for N is the largest stress of a zero-to-max
 *       cycle; that R = 0 point (S_r/2, S_r/2) is run through the Gerber and the Goodman criteria
 *       ({@code gerber_cyclic_table}, {@code goodman_cyclic_table}).</li>
 *   <li>N ≥ 10⁷ ({@link #INFINITE_FROM}): Zimmerli's infinite-life point (steels under 10 mm wire) and the table's
 *       10⁷ point, each with Gerber and Goodman ({@code gerber_zimmerli}, ...). Taking both keeps n_f from rising
 *       when more cycles are asked for.</li>
 * </ul>
 * The reported n_f is the smallest of the checks applied, along the {@link LoadLine#PROPORTIONAL} load line, and the
 * criterion names the one that gave it. Materials that are not steels have no fatigue data here: n_f = 0,
 * criterion {@code no_data}, so a cyclic requirement rejects them rather than pass them unchecked.
 */
public final class Fatigue {
    /** Fewer cycles than this count as static service: 10⁴ (common practice; Shigley's Table 10-8 starts at 10⁵). */
    public static final double STATIC_BELOW = 1e4;

    /** From this many cycles on, Zimmerli's infinite-life data apply: 10⁷ (Shigley's MED 9th ed., Sec. 10-9, from memory). */
    public static final double INFINITE_FROM = 1e7;

    /** The load line coilwise uses; see {@link LoadLine#PROPORTIONAL} for why. */
    public static final LoadLine LOAD_LINE = LoadLine.PROPORTIONAL;

    private Fatigue() {
    }

    /**
     * Fatigue check of a spring cycling between two axial forces.
     *
     * @param spring          the spring
     * @param minForce        smallest working force, N (≥ 0)
     * @param maxForce        largest working force, N (≥ minForce)
     * @param cycles          required life, cycles (≥ 1)
     * @param shotPeened      whether the wire is shot peened
     * @param staticAllowable static allowable torsional stress for the static case, Pa
     */
    public static FatigueCheck check(Spring spring, double minForce, double maxForce, double cycles, boolean shotPeened,
                                     double staticAllowable) {
        Check.nonNegative("smallest working force", minForce, "N");
        if (maxForce < minForce) {
            throw new BadInputException(String.format(Locale.ROOT,
                    "largest working force %.6g N must not be below the smallest working force %.6g N", maxForce, minForce));
        }
        double d = spring.wireDiameter();
        double dm = spring.meanDiameter();
        return assess(Stress.corrected(minForce, dm, d), Stress.corrected(maxForce, dm, d), spring.tensileStrength(),
                d, spring.material().steel(), CyclicStressTable.forMaterial(spring.material()), cycles, shotPeened,
                staticAllowable);
    }

    /**
     * Fatigue check from working stresses (see the class comment for the rules).
     *
     * @param tauMin          smallest working stress, Pa
     * @param tauMax          largest working stress, Pa
     * @param sut             tensile strength of the wire, Pa
     * @param wireDiameter    d, m (Zimmerli's data hold up to {@link FatigueStrength#ZIMMERLI_MAX_WIRE})
     * @param steel           whether the wire is a spring steel
     * @param table           column of the cyclic stress table
     * @param cycles          required life, cycles (≥ 1)
     * @param shotPeened      whether the wire is shot peened
     * @param staticAllowable static allowable torsional stress, Pa
     */
    public static FatigueCheck assess(double tauMin, double tauMax, double sut, double wireDiameter, boolean steel,
                                      CyclicStressTable table, double cycles, boolean shotPeened,
                                      double staticAllowable) {
        Check.nonNegative("smallest working stress", tauMin, "Pa");
        Check.nonNegative("largest working stress", tauMax, "Pa");
        Check.positive("cycles", cycles, "cycles");
        double tauA = (tauMax - tauMin) / 2;
        double tauM = (tauMax + tauMin) / 2;
        if (cycles < STATIC_BELOW) {
            double n = tauMax == 0 ? Double.POSITIVE_INFINITY : staticAllowable / tauMax;
            return new FatigueCheck(n, "static", tauA, tauM);
        }
        if (!steel) {
            return new FatigueCheck(0, "no_data", tauA, tauM);
        }
        if (tauA <= 0) {
            return new FatigueCheck(Double.POSITIVE_INFINITY, "static", 0, tauM);
        }
        List<FatigueStrength> points = new ArrayList<>();
        if (cycles >= INFINITE_FROM && wireDiameter <= FatigueStrength.ZIMMERLI_MAX_WIRE * (1 + 1e-9)) {
            points.add(FatigueStrength.zimmerli(shotPeened));
        }
        points.add(FatigueStrength.repeated(table.fraction(cycles, shotPeened) * sut, "cyclic_table"));
        double best = Double.POSITIVE_INFINITY;
        String criterion = "";
        for (FatigueStrength p : points) {
            for (FatigueCriterion c : FatigueCriterion.values()) {
                double n = c.safetyFactor(p, sut, LOAD_LINE, tauA, tauM);
                if (n < best) {
                    best = n;
                    criterion = c.key() + "_" + p.key();
                }
            }
        }
        return new FatigueCheck(best, criterion, tauA, tauM);
    }
}
