package dev.coilwise.mechanics;

import dev.coilwise.error.Check;
import dev.coilwise.error.InternalFaultException;

/**
 * The fatigue verdict on a spring working between two forces for a number of cycles. SI throughout.
 *
 * @param safetyFactor    fatigue factor of safety n_f = S_sa/τ_a along the load line (the smallest over every
 *                        criterion and strength data set applied); below 10⁴ cycles the static ratio
 *                        allowable/τ_max; 0 when coilwise has no fatigue data for the material;
 *                        +∞ when the stress does not vary
 * @param criterion       which check governs: {@code gerber_zimmerli}, {@code goodman_zimmerli},
 *                        {@code gerber_cyclic_table}, {@code goodman_cyclic_table}, {@code static} or {@code no_data}
 *                        (see {@link Fatigue})
 * @param stressAmplitude τ_a = (τ_max − τ_min)/2, corrected with the Bergsträsser factor, Pa
 * @param stressMean      τ_m = (τ_max + τ_min)/2, corrected with the Bergsträsser factor, Pa
 */
public record FatigueCheck(double safetyFactor, String criterion, double stressAmplitude, double stressMean) {
    public FatigueCheck {
        Check.notNull("fatigue criterion", criterion);
        if (Double.isNaN(safetyFactor) || safetyFactor < 0) {
            throw new InternalFaultException("fatigue safety factor must be ≥ 0, got " + safetyFactor);
        }
        Check.nonNegative("stress amplitude", stressAmplitude, "Pa");
        Check.nonNegative("mean stress", stressMean, "Pa");
    }
}
