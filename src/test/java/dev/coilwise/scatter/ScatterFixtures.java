package dev.coilwise.scatter;

import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.Clearance;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Envelope;
import dev.coilwise.model.Job;
import dev.coilwise.model.Launch;
import dev.coilwise.model.Limits;
import dev.coilwise.model.Ranking;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Seating;
import dev.coilwise.model.Spring;
import dev.coilwise.model.SpringOptions;
import dev.coilwise.model.UnitSystem;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/** Invented demo scenarios for the scatter tests (demo data, not check values). */
final class ScatterFixtures {
    static final MaterialTable TABLE = MaterialTable.loadDefault();

    /** Music wire, d 2 mm, D 16 mm, 10 active coils, L0 60 mm, closed and ground. */
    static final Spring SPRING = new Spring(TABLE.get("music-wire"), EndType.CLOSED_GROUND, 2e-3, 16e-3, 10, 60e-3);

    /** Grade-2-like half-widths, invented for the tests: d ±0.02 mm, D ±0.2 mm, L0 ±1 mm, ±¼ coil, G ±2 %. */
    static final HalfWidths TYPICAL = new HalfWidths(0.02e-3, 0.2e-3, 1e-3, 0.25, 0.02);

    /** A 0.5 kg load dropping at 0.8 m/s onto the spring in a 55 mm pocket. */
    static final Arrest ARREST = new Arrest(0.5, 0.8, Math.PI / 2, 0, Double.NaN);

    /** A 20 g payload thrown 0.5 m straight up, 5 % losses. */
    static final Launch LAUNCH = new Launch(0.02, 0.5, Math.PI / 2, 0.05);

    private ScatterFixtures() {
    }

    static Requirement arrest(OptionalDouble peakForce) {
        return requirement(ARREST, OptionalDouble.of(55e-3), peakForce, false);
    }

    /** The launch; {@code solidSafe} makes the stress at solid (5.5 % to spare on this spring) a hard limit. */
    static Requirement launch(boolean solidSafe) {
        return requirement(LAUNCH, OptionalDouble.empty(), OptionalDouble.empty(), solidSafe);
    }

    static Requirement requirement(Job job, OptionalDouble pocket, OptionalDouble peakForce, boolean solidSafe) {
        SpringOptions opt = new SpringOptions(List.of(), List.of(EndType.CLOSED_GROUND), 4, 12, 3, 20, 0.15, solidSafe,
                false, Seating.FLAT_FLAT, Optional.empty(), OptionalDouble.empty(), false, 1.0, 2);
        Envelope env = new Envelope(OptionalDouble.empty(), OptionalDouble.empty(), Clearance.DEFAULT,
                OptionalDouble.empty(), pocket);
        return new Requirement("demo", job, new Limits(0.03, peakForce, OptionalDouble.empty()), env, opt,
                Ranking.defaults(), UnitSystem.SI, List.of());
    }
}
