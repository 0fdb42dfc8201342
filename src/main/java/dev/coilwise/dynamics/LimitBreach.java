package dev.coilwise.dynamics;

import dev.coilwise.error.Check;

/**
 * One hard limit of the requirement that a simulated event breaks (see {@link SimulatedLimits}).
 *
 * @param limit     which limit, by the evaluator's margin key where there is one ({@code stroke}, {@code peak_force},
 *                  {@code deceleration}, {@code stress_working}, {@code coil_bind}, {@code fatigue}) and otherwise
 *                  {@code event} (the simulated event did not end), {@code launch_exit} (the payload stays in the
 *                  guide) or {@code launch_height} (the apex is outside the launch band)
 * @param simulated the simulated figure, SI (m, N, m/s², Pa, or a plain factor); NaN when the breach is no figure
 * @param allowed   the bound it breaks, SI in the same unit; NaN when the breach is no figure
 * @param words     one sentence for a person, naming the limit and both figures in the requirement's units
 */
public record LimitBreach(String limit, double simulated, double allowed, String words) {
    public LimitBreach {
        Check.notNull("breached limit", limit);
        Check.notNull("words of the breach", words);
    }
}
