package dev.coilwise.mechanics;

import dev.coilwise.model.Spring;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;

/**
 * Every working figure and margin of one spring against one requirement. SI throughout; NaN where a figure does not
 * apply to the job (e.g. deceleration for a launch).
 *
 * @param spring              the spring as ordered
 * @param job                 {@code arrest} or {@code launch}
 * @param rate                k, N/m
 * @param preloadForce        F0 at the installed length, N (0 without a pocket)
 * @param preloadDeflection   L0 − installed length, m
 * @param workingDeflection   arrest: largest compression from first contact; launch: cocked compression, m
 * @param totalDeflection     preload deflection + working deflection, m
 * @param peakForce           arrest: peak force; launch: cocking force, N
 * @param peakDeceleration    arrest: peak deceleration of the load, m/s²; launch: NaN
 * @param speed               arrest: contact speed; launch: exit speed, m/s
 * @param predictedHeight     launch: apex rise above the muzzle, m; arrest: NaN
 * @param stressAtWorking     corrected stress at peak (arrest) or cocked (launch), Pa
 * @param stressAtSolid       corrected stress at solid, Pa
 * @param tensileStrength     Sut of the wire, Pa
 * @param allowableStress     static allowable torsional stress, Pa
 * @param outerDiameterAtSolid OD at solid, m
 * @param criticalDeflection  buckling deflection, m (+∞ if stable)
 * @param naturalFrequency    fixed-fixed natural frequency, Hz
 * @param surgeSpeedLimit     end speed whose surge stress reaches the allowable, m/s
 * @param mass                whole spring mass, kg
 * @param cost                mass × relative wire cost (relative units, kg-equivalent of hard-drawn wire)
 * @param margins             every limit checked, hard and reported
 * @param fatigue             the cycle-life check, present when the requirement asks for 10⁴ cycles or more
 *                            (see {@link Fatigue})
 */
public record Evaluation(Spring spring, String job, double rate, double preloadForce, double preloadDeflection,
                         double workingDeflection, double totalDeflection, double peakForce, double peakDeceleration,
                         double speed, double predictedHeight, double stressAtWorking, double stressAtSolid,
                         double tensileStrength, double allowableStress, double outerDiameterAtSolid,
                         double criticalDeflection, double naturalFrequency, double surgeSpeedLimit, double mass,
                         double cost, List<Margin> margins, Optional<FatigueCheck> fatigue) {

    public Evaluation {
        margins = List.copyOf(margins);
        fatigue = fatigue == null ? Optional.empty() : fatigue;
    }

    /** True when every hard margin holds. */
    public boolean feasible() {
        return margins.stream().filter(Margin::hard).allMatch(Margin::holds);
    }

    /** The hard margins that fail, worst first. */
    public List<Margin> violations() {
        return margins.stream().filter(m -> m.hard() && !m.holds())
                .sorted(Comparator.comparingDouble(Margin::value)).toList();
    }

    /** The binding limit: the hard margin with the least to spare (the most violated one if infeasible). */
    public Optional<Margin> binding() {
        return margins.stream().filter(Margin::hard).min(Comparator.comparingDouble(Margin::value));
    }

    public Optional<Margin> margin(String key) {
        return margins.stream().filter(m -> m.key().equals(key)).findFirst();
    }
}
