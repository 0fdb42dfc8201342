package dev.coilwise.report;

import dev.coilwise.materials.MaterialTable;
import dev.coilwise.mechanics.DesignEvaluator;
import dev.coilwise.mechanics.Evaluation;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.Clearance;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Envelope;
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

/** Invented design scenarios for the specification-sheet tests. */
final class SpecSheets {
    static final MaterialTable TABLE = MaterialTable.loadDefault();

    private SpecSheets() {
    }

    /** Music wire d = 3 mm, D = 24 mm, 6 active coils, L0 = 60 mm, closed and ground. */
    static Spring buffer() {
        return new Spring(TABLE.get("music-wire"), EndType.CLOSED_GROUND, 3e-3, 24e-3, 6, 0.060);
    }

    /** 2 kg arriving at 1.5 m/s straight down, 40 mm stroke, 50 mm pocket in a 32 mm bore; set removed, peened. */
    static Requirement bufferRequirement() {
        SpringOptions opt = new SpringOptions(List.of(), List.of(EndType.CLOSED_GROUND, EndType.CLOSED), 4, 12, 3, 20,
                0.15, true, true, Seating.FLAT_FLAT, Optional.empty(), OptionalDouble.of(1e5), true, 1.0, 2);
        Envelope env = new Envelope(OptionalDouble.of(0.032), OptionalDouble.empty(), Clearance.DEFAULT,
                OptionalDouble.empty(), OptionalDouble.of(0.050));
        return new Requirement("Demo carriage end stop", new Arrest(2.0, 1.5, Math.PI / 2, 0, Double.NaN),
                new Limits(0.040, OptionalDouble.empty(), OptionalDouble.empty()), env, opt, Ranking.defaults(),
                UnitSystem.SI, List.of());
    }

    /** Music wire 0.055 in, OD 0.5 in, 10 active coils, L0 2.5 in, closed ends. */
    static Spring launcher() {
        double in = 0.0254;
        return new Spring(TABLE.get("music-wire"), EndType.CLOSED, 0.055 * in, (0.5 - 0.055) * in, 10, 2.5 * in);
    }

    /** 20 g thrown 1 m straight up, US units, over a 0.3 in rod. */
    static Requirement launcherRequirement() {
        Envelope env = new Envelope(OptionalDouble.empty(), OptionalDouble.of(0.3 * 0.0254), Clearance.DEFAULT,
                OptionalDouble.empty(), OptionalDouble.empty());
        return new Requirement("Demo ball popper", new Launch(0.020, 1.0, Math.PI / 2, 0.05),
                new Limits(0.040, OptionalDouble.empty(), OptionalDouble.empty()), env, SpringOptions.defaults(),
                Ranking.defaults(), UnitSystem.US, List.of());
    }

    /** {@code mass} kg arriving at {@code speed} m/s straight down onto an unguided spring with no pocket. */
    static Requirement arrestWithoutPocket(double mass, double speed, double stroke) {
        return new Requirement("Demo stop", new Arrest(mass, speed, Math.PI / 2, 0, Double.NaN),
                new Limits(stroke, OptionalDouble.empty(), OptionalDouble.empty()), Envelope.open(),
                SpringOptions.defaults(), Ranking.defaults(), UnitSystem.SI, List.of());
    }

    static Evaluation evaluate(Spring s, Requirement r) {
        return DesignEvaluator.evaluate(s, r);
    }

    static SpecSheet bufferSheet() {
        Spring s = buffer();
        Requirement r = bufferRequirement();
        return SpecSheet.build(s, evaluate(s, r), r, 2, 500);
    }

    static SpecSheet launcherSheet() {
        Spring s = launcher();
        Requirement r = launcherRequirement();
        return SpecSheet.build(s, evaluate(s, r), r,
                new Order(2000, 3, Optional.of(Order.Helix.LEFT), "zinc phosphate and oil"));
    }
}
