package dev.coilwise.search;

import dev.coilwise.model.Arrest;
import dev.coilwise.model.Clearance;
import dev.coilwise.model.EndType;
import dev.coilwise.model.Envelope;
import dev.coilwise.model.Gravity;
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
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.SplittableRandom;

/**
 * Seeded, varied requirements for search tests and benchmarks (invented scenarios, never check values): both jobs,
 * both unit systems, with and without pockets, bores, rods, free-length, force and deceleration limits, cycle counts,
 * and every ranking. Loads, strokes and limits are drawn around a hand energy balance so that most scenarios have
 * feasible designs and some are tight or infeasible. The same seed always gives the same list.
 */
public final class RequirementGenerator {
    private static final List<String> STEELS = List.of("music-wire", "oil-tempered", "hard-drawn", "chrome-vanadium",
            "chrome-silicon", "stainless-302");

    private RequirementGenerator() {
    }

    /** {@code count} requirements from {@code seed}. */
    public static List<Requirement> generate(long seed, int count) {
        SplittableRandom r = new SplittableRandom(seed);
        List<Requirement> out = new ArrayList<>();
        for (int i = 0; i < count; i++) {
            out.add(one(r.split(), i));
        }
        return out;
    }

    private static Requirement one(SplittableRandom r, int i) {
        UnitSystem units = r.nextBoolean() ? UnitSystem.SI : UnitSystem.US;
        boolean arrest = r.nextInt(5) < 3;
        RankBy by = RankBy.values()[r.nextInt(RankBy.values().length)];
        double stroke = between(r, 0.012, 0.08);
        Job job;
        double force;
        OptionalDouble decel = OptionalDouble.empty();
        OptionalDouble pocket = OptionalDouble.empty();
        if (arrest) {
            double mass = Math.exp(between(r, Math.log(0.3), Math.log(40)));
            double angle = switch (r.nextInt(4)) {
                case 0 -> Math.PI / 2;
                case 1 -> 0;
                case 2 -> Math.toRadians(30);
                default -> Math.toRadians(-20);
            };
            double energy = between(r, 0.3, 12);
            double speed = Math.sqrt(2 * energy / mass);
            double drive = r.nextInt(3) == 0 ? between(r, 5, 60) : 0;
            Arrest a = new Arrest(mass, speed, angle, drive, Double.NaN);
            job = a;
            force = 2 * (a.kineticEnergy() + Math.max(0, a.pushForce()) * stroke) / stroke + Math.max(0, a.pushForce());
            if (r.nextInt(3) == 0) {
                decel = OptionalDouble.of((force - a.pushForce()) / mass * between(r, 1.1, 3));
            }
            if (r.nextInt(3) == 0) {
                pocket = OptionalDouble.of(stroke * between(r, 2, 4));
            }
        } else {
            double mass = Math.exp(between(r, Math.log(0.02), Math.log(1.0)));
            double angle = Math.toRadians(r.nextBoolean() ? 90 : between(r, 30, 80));
            double energy = between(r, 0.3, 10);
            double height = energy / (mass * Gravity.STANDARD) * Math.pow(Math.sin(angle), 2);
            Launch l = new Launch(mass, Math.max(0.05, height), angle, r.nextBoolean() ? 0 : between(r, 0.02, 0.15));
            job = l;
            double c = 0.5 * mass * l.requiredExitSpeed() * l.requiredExitSpeed();
            force = 2 * (c + mass * Gravity.STANDARD * Math.sin(angle) * stroke) / (l.efficiency() * stroke);
        }
        Limits limits = new Limits(stroke, r.nextInt(3) == 0 ? OptionalDouble.of(force * between(r, 1.2, 3))
                : OptionalDouble.empty(), decel);
        OptionalDouble bore = OptionalDouble.empty();
        OptionalDouble rod = OptionalDouble.empty();
        if (r.nextInt(3) == 0) {
            bore = OptionalDouble.of(between(r, 0.015, 0.06));
        }
        if (r.nextInt(3) == 0) {
            double top = bore.isPresent() ? bore.getAsDouble() * 0.6 : 0.03;
            rod = OptionalDouble.of(between(r, 0.004, Math.max(0.005, top)));
        }
        OptionalDouble maxFree = r.nextInt(5) < 2
                ? OptionalDouble.of(pocket.orElse(stroke * 2) * between(r, 1.3, 3)) : OptionalDouble.empty();
        Envelope env = new Envelope(bore, rod, r.nextBoolean() ? Clearance.DEFAULT : Clearance.ofLength(0.001), maxFree,
                pocket);
        List<String> mats = new ArrayList<>();
        int nMat = 1 + r.nextInt(3);
        while (mats.size() < nMat) {
            String m = STEELS.get(r.nextInt(STEELS.size()));
            if (!mats.contains(m)) {
                mats.add(m);
            }
        }
        List<EndType> ends = r.nextBoolean() ? List.of(EndType.CLOSED_GROUND, EndType.CLOSED)
                : List.of(EndType.values()[r.nextInt(EndType.values().length)]);
        OptionalDouble cycles = r.nextInt(4) == 0 ? OptionalDouble.of(Math.pow(10, between(r, 4, 7.5)))
                : OptionalDouble.empty();
        SpringOptions opt = new SpringOptions(mats, ends, 4, 12, 3, 20, r.nextInt(4) == 0 ? 0.1 : 0.15,
                r.nextInt(5) != 0, r.nextInt(4) == 0, Seating.values()[r.nextInt(2)], Optional.empty(), cycles,
                r.nextBoolean(), 1.0, 2);
        return new Requirement("generated " + i + " (" + (arrest ? "arrest" : "launch") + ", " + units + ", by "
                + by.key() + ")", job, limits, env, opt, new Ranking(by, 10, Prefer.NONE, false, OptionalDouble.empty()),
                units, List.of());
    }

    private static double between(SplittableRandom r, double lo, double hi) {
        return lo + (hi - lo) * r.nextDouble();
    }
}
