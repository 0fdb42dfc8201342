package dev.coilwise.search;

import dev.coilwise.materials.MaterialTable;
import dev.coilwise.model.Arrest;
import dev.coilwise.model.Clearance;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Envelope;
import dev.coilwise.model.Job;
import dev.coilwise.model.Launch;
import dev.coilwise.model.Limits;
import dev.coilwise.model.Prefer;
import dev.coilwise.model.RankBy;
import dev.coilwise.model.Ranking;
import dev.coilwise.model.Requirement;
import dev.coilwise.model.Seating;
import dev.coilwise.model.SpringOptions;
import dev.coilwise.model.UnitSystem;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/** Builders for requirements used by search tests (test scenarios, not check values). */
final class SearchFixtures {
    static final MaterialTable TABLE = MaterialTable.loadDefault();

    private SearchFixtures() {
    }

    static SpringOptions options(List<String> materials, List<EndType> ends, double cMin, double cMax, double nMin,
                                 double nMax) {
        return new SpringOptions(materials, ends, cMin, cMax, nMin, nMax, 0.15, true, false, Seating.FLAT_FLAT,
                Optional.empty(), OptionalDouble.empty(), false, 1.0, 2);
    }

    static Requirement requirement(Job job, Limits limits, Envelope env, SpringOptions opt, RankBy by) {
        return new Requirement("test", job, limits, env, opt,
                new Ranking(by, 10, Prefer.NONE, false, OptionalDouble.empty()), UnitSystem.SI, List.of());
    }

    static Arrest drop(double mass, double height) {
        return new Arrest(mass, Math.sqrt(2 * 9.80665 * height), Math.PI / 2, 0, height);
    }

    static Launch launch(double mass, double height, double angleDeg, double losses) {
        return new Launch(mass, height, Math.toRadians(angleDeg), losses);
    }

    static Limits limits(double stroke, Double force, Double decel) {
        return new Limits(stroke, force == null ? OptionalDouble.empty() : OptionalDouble.of(force),
                decel == null ? OptionalDouble.empty() : OptionalDouble.of(decel));
    }

    static Envelope envelope(Double bore, Double rod, Double maxL0, Double pocket) {
        return new Envelope(opt(bore), opt(rod), Clearance.DEFAULT, opt(maxL0), opt(pocket));
    }

    private static OptionalDouble opt(Double v) {
        return v == null ? OptionalDouble.empty() : OptionalDouble.of(v);
    }

    /**
     * The design space of {@code req} restricted to wire diameters in [dMin, dMax] m and put on a coarse
     * {@code step} (m) grid, to keep brute force small.
     */
    static DesignSpace narrowed(Requirement req, double dMin, double dMax, double step) {
        DesignSpace full = DesignSpace.of(req, TABLE);
        List<Family> fams = full.families().stream()
                .filter(f -> f.wireDiameter() >= dMin && f.wireDiameter() <= dMax).toList();
        return new DesignSpace(req, new Grid(step), full.materials(), full.ends(),
                full.wireDiameters().stream().filter(d -> d >= dMin && d <= dMax).toList(), fams);
    }
}
