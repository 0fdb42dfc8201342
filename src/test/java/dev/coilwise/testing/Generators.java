package dev.coilwise.testing;

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
import dev.coilwise.model.Seating;
import dev.coilwise.model.Spring;
import dev.coilwise.model.SpringOptions;
import dev.coilwise.model.UnitSystem;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;

/** jqwik generators of valid springs and requirements over wide ranges, shared by the property tests. */
public final class Generators {
    public static final MaterialTable TABLE = MaterialTable.loadDefault();

    private Generators() {
    }

    /**
     * A double spread evenly between {@code lo} and {@code hi}, both included. jqwik draws decimals at a fixed scale,
     * so the unit interval is drawn at 15 decimals and stretched.
     */
    public static Arbitrary<Double> uniform(double lo, double hi) {
        return Arbitraries.doubles().between(0, 1).ofScale(15).map(u -> u == 1 ? hi : lo + u * (hi - lo));
    }

    /** A double spread evenly on a log scale between {@code lo} and {@code hi} (both &gt; 0), both included. */
    public static Arbitrary<Double> logUniform(double lo, double hi) {
        return uniform(Math.log(lo), Math.log(hi)).map(Math::exp).map(v -> Math.min(hi, Math.max(lo, v)));
    }

    public static Arbitrary<Material> materials() {
        return Arbitraries.of(TABLE.all());
    }

    /** Any valid spring: wire across each material's whole range, index 1.05..30, 0.5..100 coils, L0 up to 6·Ls. */
    public static Arbitrary<Spring> springs() {
        return materials().flatMap(m -> Combinators.combine(
                logUniform(m.minDiameter(), m.maxDiameter()),
                uniform(1.05, 30),
                logUniform(0.5, 100),
                Arbitraries.of(EndType.values()),
                uniform(1e-3, 5)).as((d, c, na, ends, extra) -> {
                    double ls = ends.solidLength(d, ends.totalCoils(na));
                    return new Spring(m, ends, d, c * d, na, ls * (1 + extra));
                }));
    }

    public static Arbitrary<Job> jobs() {
        Arbitrary<Job> arrest = Combinators.combine(logUniform(1e-3, 1e4), uniform(0, 50),
                uniform(-Math.PI / 2, Math.PI / 2), uniform(0, 1e4))
                .as((m, v, a, f) -> new Arrest(m, v, a, f, Double.NaN));
        Arbitrary<Job> launch = Combinators.combine(logUniform(1e-3, 100), logUniform(1e-2, 100),
                uniform(0.01, Math.PI / 2), uniform(0, 0.9))
                .as(Launch::new);
        return Arbitraries.oneOf(arrest, launch);
    }

    private static Arbitrary<OptionalDouble> maybe(Arbitrary<Double> values) {
        return Arbitraries.oneOf(Arbitraries.just(OptionalDouble.empty()), values.map(OptionalDouble::of));
    }

    public static Arbitrary<Envelope> envelopes() {
        return Combinators.combine(maybe(logUniform(1e-3, 1)), uniform(0.05, 0.95),
                Arbitraries.of(true, false), maybe(logUniform(1e-3, 2)), uniform(0.2, 1))
                .as((bore, rodShare, withRod, maxL0, pocketShare) -> {
                    OptionalDouble rod = withRod ? OptionalDouble.of(bore.orElse(0.1) * rodShare) : OptionalDouble.empty();
                    OptionalDouble pocket = maxL0.isPresent() ? OptionalDouble.of(maxL0.getAsDouble() * pocketShare)
                            : OptionalDouble.empty();
                    return new Envelope(bore, rod, Clearance.DEFAULT, maxL0, pocket);
                });
    }

    public static Arbitrary<Requirement> requirements() {
        Arbitrary<Limits> limits = Combinators.combine(logUniform(1e-4, 10), maybe(logUniform(1e-2, 1e7)),
                maybe(logUniform(1, 1e5))).as(Limits::new);
        Arbitrary<SpringOptions> options = Combinators.combine(uniform(0, 2),
                Arbitraries.of(true, false), Arbitraries.of(true, false), Arbitraries.of(Seating.values()))
                .as((xi, solidSafe, setRemoved, seating) -> new SpringOptions(List.of(), List.of(EndType.CLOSED_GROUND),
                        4, 12, 3, 20, xi, solidSafe, setRemoved, seating, Optional.empty(), OptionalDouble.empty(),
                        false, 1.0, 2));
        return Combinators.combine(jobs(), limits, envelopes(), options).as((job, lim, env, opt) ->
                new Requirement("generated", job, lim, env, opt, Ranking.defaults(), UnitSystem.SI, List.of()));
    }
}
