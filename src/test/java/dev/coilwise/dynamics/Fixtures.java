package dev.coilwise.dynamics;

import dev.coilwise.materials.Material;
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
import dev.coilwise.model.Spring;
import dev.coilwise.model.SpringOptions;
import dev.coilwise.model.UnitSystem;
import java.util.List;
import java.util.OptionalDouble;

/**
 * Springs and requirements for the dynamics tests. The spring is an ordinary catalogue-like design (music wire
 * 3 mm, mean diameter 24 mm, index 8, 10 active coils, closed and ground, free length 80 mm) with the material
 * figures of the bundled table: it is input only. Every check value in the tests comes from a closed form or a
 * published relation, never from this class.
 */
final class Fixtures {
    static final MaterialTable TABLE = MaterialTable.loadDefault();

    private Fixtures() {
    }

    static Material musicWire() {
        return TABLE.get("music-wire");
    }

    /** The same material with its density multiplied by {@code factor} (the massless-spring limit). */
    static Material withDensityScaled(Material m, double factor) {
        return new Material(m.key(), m.name(), m.standard(), m.steel(), m.density() * factor, m.relativeCost(),
                m.allowableStatic(), m.allowableSetRemoved(), m.strength(), m.moduli(), m.source());
    }

    static Spring spring(Material m) {
        return new Spring(m, EndType.CLOSED_GROUND, 3e-3, 24e-3, 10, 80e-3);
    }

    static Spring spring() {
        return spring(musicWire());
    }

    static Requirement requirement(Job job, OptionalDouble pocket) {
        Envelope env = new Envelope(OptionalDouble.empty(), OptionalDouble.empty(), Clearance.DEFAULT,
                OptionalDouble.empty(), pocket);
        return new Requirement("dynamics test", job, new Limits(1.0, OptionalDouble.empty(), OptionalDouble.empty()),
                env, SpringOptions.defaults(), Ranking.defaults(), UnitSystem.SI, List.of());
    }

    static Requirement arrest(double mass, double speed, double angle, double drive) {
        return requirement(new Arrest(mass, speed, angle, drive, Double.NaN), OptionalDouble.empty());
    }

    static Requirement drop(double mass, double height) {
        return requirement(new Arrest(mass, Math.sqrt(2 * 9.80665 * height), Math.PI / 2, 0, height),
                OptionalDouble.empty());
    }

    static Requirement launch(double mass, double height, double angle, double losses) {
        return requirement(new Launch(mass, height, angle, losses), OptionalDouble.empty());
    }
}
