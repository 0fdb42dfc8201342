package dev.coilwise.report.html;

import java.util.List;
import java.util.Optional;

/**
 * The time-domain check of one design (a spring that has mass, split into lumped masses), as saved under
 * {@code designs[i].simulation}. SI; NaN where a figure does not apply to the job.
 *
 * @param masses         lumped masses used
 * @param maxCompression arrest: largest travel of the load from contact; launch: cocked compression, m
 * @param peakForce      largest force between spring and load, N
 * @param peakStress     largest corrected shear stress of any element, Pa
 * @param coilClash      whether coils closed up during the event
 * @param firstClashTime time of the first clash, s (NaN without one)
 * @param deviationPct   largest difference from the massless energy balance, %
 * @param stopTime       arrest: time from contact to the load's stop, s
 * @param reboundSpeed   arrest: speed of the load as it leaves the spring, m/s
 * @param exitSpeed      launch: exit speed, m/s
 * @param apex           launch: apex rise above the muzzle, m
 * @param flags          warnings raised by the simulation
 * @param notes          information that is no fault of the design
 * @param history        the time history, when it was saved
 */
public record SimulationView(int masses, double maxCompression, double peakForce, double peakStress,
                             boolean coilClash, double firstClashTime, double deviationPct, double stopTime,
                             double reboundSpeed, double exitSpeed, double apex, List<String> flags,
                             List<String> notes, Optional<TimeSeries> history) {
    public SimulationView {
        flags = List.copyOf(flags);
        notes = List.copyOf(notes);
    }

    static SimulationView from(JsonIn s) {
        return new SimulationView(s.integer("masses"), s.mm("max_compression_mm"), s.number("peak_force_N"),
                s.number("peak_stress_MPa") * 1e6, s.flag("coil_clash"), s.optionalNumber("first_clash_ms") * 1e-3,
                s.number("deviation_pct"), s.optionalNumber("stop_time_ms") * 1e-3,
                s.optionalNumber("rebound_speed_m_per_s"), s.optionalNumber("exit_speed_m_per_s"),
                s.optionalNumber("apex_mm") * 1e-3, s.texts("flags"), s.texts("notes"),
                s.optionalObject("history").map(TimeSeries::from));
    }
}
