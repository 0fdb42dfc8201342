package dev.coilwise.model;

import dev.coilwise.error.BadInputException;
import dev.coilwise.error.Check;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * The design space and design rules.
 *
 * @param materials      material keys to search (empty = all steels of the material table)
 * @param ends           end types to search
 * @param indexMin       smallest spring index C = D/d
 * @param indexMax       largest spring index
 * @param coilsMin       fewest active coils
 * @param coilsMax       most active coils
 * @param clashAllowance fractional overrun to closure ξ: L0 − Ls ≥ (1 + ξ)·(largest working deflection)
 * @param solidSafe      stress at solid must stay within the allowable
 * @param setRemoved     the spring is set-removed (higher static allowable)
 * @param seating        end condition for buckling
 * @param wireSeries     preferred wire series, or empty to follow the requirement's unit system
 * @param cycles         required load cycles, or empty for a static spring (below 10⁴)
 * @param shotPeened     the wire is shot peened (fatigue)
 * @param fatigueMargin  smallest fatigue safety factor accepted (default 1.0)
 * @param toleranceGrade EN 15800 tolerance grade 1, 2 or 3 (default 2)
 */
public record SpringOptions(List<String> materials, List<EndType> ends, double indexMin, double indexMax,
                            double coilsMin, double coilsMax, double clashAllowance, boolean solidSafe,
                            boolean setRemoved, Seating seating, Optional<WireSeries> wireSeries,
                            OptionalDouble cycles, boolean shotPeened, double fatigueMargin, int toleranceGrade) {

    public SpringOptions {
        materials = List.copyOf(materials);
        ends = List.copyOf(ends);
        if (ends.isEmpty()) {
            throw new BadInputException("spring.ends must list at least one end type");
        }
        Check.inRange("spring.index (low end)", indexMin, 2, 30, "");
        Check.inRange("spring.index (high end)", indexMax, 2, 30, "");
        if (indexMin > indexMax) {
            throw new BadInputException("spring.index: the low end " + indexMin + " exceeds the high end " + indexMax);
        }
        Check.inRange("spring.active_coils (low end)", coilsMin, 1, 200, "");
        Check.inRange("spring.active_coils (high end)", coilsMax, 1, 200, "");
        if (coilsMin > coilsMax) {
            throw new BadInputException("spring.active_coils: the low end " + coilsMin + " exceeds the high end " + coilsMax);
        }
        Check.inRange("spring.clash_allowance", clashAllowance, 0, 2, "(fraction)");
        Check.notNull("spring.seating", seating);
        cycles.ifPresent(c -> Check.inRange("spring.cycles", c, 1, 1e10, "cycles"));
        Check.inRange("spring.fatigue_margin", fatigueMargin, 0.5, 5, "");
        if (toleranceGrade < 1 || toleranceGrade > 3) {
            throw new BadInputException("spring.tolerance_grade must be 1, 2 or 3, got " + toleranceGrade);
        }
    }

    /** Index range 4..12, 3..20 active coils, ξ = 0.15, closed-ground and closed ends: the defaults (common practice). */
    public static SpringOptions defaults() {
        return new SpringOptions(List.of(), List.of(EndType.CLOSED_GROUND, EndType.CLOSED), 4, 12, 3, 20, 0.15, true,
                false, Seating.FLAT_FLAT, Optional.empty(), OptionalDouble.empty(), false, 1.0, 2);
    }
}
