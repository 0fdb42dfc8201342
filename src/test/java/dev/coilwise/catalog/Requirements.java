package dev.coilwise.catalog;

import dev.coilwise.model.Arrest;
import dev.coilwise.model.Clearance;
import dev.coilwise.model.Envelope;
import dev.coilwise.model.Launch;
import dev.coilwise.model.Limits;
import dev.coilwise.model.Ranking;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.SpringOptions;
import dev.coilwise.model.UnitSystem;
import java.util.List;
import java.util.OptionalDouble;

/** Requirements for catalogue tests (invented scenarios). */
final class Requirements {
    private Requirements() {
    }

    /** A load of {@code mass} kg falling onto the spring at {@code speed} m/s, stroke limit {@code stroke} m. */
    static Requirement arrest(double mass, double speed, double stroke, OptionalDouble pocket) {
        Envelope env = new Envelope(OptionalDouble.empty(), OptionalDouble.empty(), Clearance.DEFAULT,
                OptionalDouble.empty(), pocket);
        return new Requirement("demo arrest", new Arrest(mass, speed, Math.PI / 2, 0, Double.NaN),
                new Limits(stroke, OptionalDouble.empty(), OptionalDouble.empty()), env, SpringOptions.defaults(),
                Ranking.defaults(), UnitSystem.SI, List.of());
    }

    /** Throw {@code mass} kg straight up {@code height} m, cocked stroke limit {@code stroke} m. */
    static Requirement launch(double mass, double height, double stroke) {
        return new Requirement("demo launch", new Launch(mass, height, Math.PI / 2, 0.05),
                new Limits(stroke, OptionalDouble.empty(), OptionalDouble.empty()), Envelope.open(),
                SpringOptions.defaults(), Ranking.defaults(), UnitSystem.SI, List.of());
    }
}
