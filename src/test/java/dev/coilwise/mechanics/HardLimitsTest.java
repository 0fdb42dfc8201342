package dev.coilwise.mechanics;

import static org.assertj.core.api.Assertions.assertThat;

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
import java.util.Random;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.statistics.Statistics;
import net.jqwik.api.statistics.StatisticsReport;

/**
 * {@link HardLimits} must answer exactly as {@code DesignEvaluator.evaluate(...).feasible()} does, for any spring
 * and any requirement. The cases are generated (invented scenarios, not check values); about half of them have their
 * limits set from the spring's own figures within a few parts per billion, so that the margins sit on the edge of
 * holding, where a difference in rounding would show.
 */
class HardLimitsTest {
    private static final MaterialTable TABLE = MaterialTable.loadDefault();

    /** A spring and a requirement to check it against. */
    record Case(Spring spring, Requirement requirement) {
    }

    @Property(tries = 4000)
    @StatisticsReport(StatisticsReport.StatisticsReportMode.OFF)
    void answersExactlyAsTheFullEvaluation(@ForAll("cases") Case c) {
        boolean full = DesignEvaluator.evaluate(c.spring(), c.requirement()).feasible();
        boolean quick = HardLimits.of(c.requirement(), c.spring().material(), c.spring().wireDiameter()).feasible(c.spring());
        Statistics.label("feasible").collect(full);
        Statistics.label("feasible").coverage(cov -> {
            cov.check(true).percentage(p -> p > 5);
            cov.check(false).percentage(p -> p > 5);
        });
        assertThat(quick).as("quick check of %s against %s", c.spring(), c.requirement()).isEqualTo(full);
    }

    @Property(tries = 2000)
    void marginRuleIsThatOfMargin(@ForAll("figures") double actual, @ForAll("figures") double allowed) {
        assertThat(HardLimits.atMost(actual, allowed)).isEqualTo(Margin.atMost("k", actual, allowed, "", true).holds());
        assertThat(HardLimits.atLeast(actual, allowed)).isEqualTo(Margin.atLeast("k", actual, allowed, "", true).holds());
    }

    @Provide
    Arbitrary<Double> figures() {
        Arbitrary<Double> wide = Arbitraries.doubles().between(-1e3, 1e3).ofScale(6);
        Arbitrary<Double> nearOne = Arbitraries.doubles().between(1 - 3e-9, 1 + 3e-9).ofScale(12);
        return Arbitraries.oneOf(wide, nearOne, Arbitraries.of(0.0, 1.0, Double.POSITIVE_INFINITY));
    }

    @Provide
    Arbitrary<Case> cases() {
        return Arbitraries.randomValue(HardLimitsTest::randomCase);
    }

    private static Case randomCase(Random r) {
        List<Material> mats = TABLE.all();
        Material m = mats.get(r.nextInt(mats.size()));
        double d = m.minDiameter() * Math.pow(m.maxDiameter() / m.minDiameter(), r.nextDouble());
        EndType ends = EndType.values()[r.nextInt(EndType.values().length)];
        double dm = d * (3 + 13 * r.nextDouble());
        double na = 1 + Math.floor(r.nextDouble() * 100) / 4;
        double ls = ends.solidLength(d, ends.totalCoils(na));
        double xi = r.nextInt(4) == 0 ? 0 : 0.3 * r.nextDouble();
        Spring probe = new Spring(m, ends, d, dm, na, ls * 2);
        double k = probe.rate();
        double toSolid = Stress.forceFor(m.allowableStress(d, false), dm, d) / k * (0.5 + 0.7 * r.nextDouble());
        double l0 = Math.max(ls * 1.01, ls + toSolid);
        Spring s = probe.withFreeLength(l0);
        double x = (l0 - ls) / (1 + xi) * (0.3 + 0.8 * r.nextDouble());
        boolean arrest = r.nextBoolean();
        Job job;
        if (arrest) {
            double mass = Math.exp(r.nextDouble() * 8 - 4);
            Arrest a = new Arrest(mass, 0, Math.PI * (r.nextDouble() - 0.5), r.nextInt(3) == 0 ? 40 * r.nextDouble() : 0, Double.NaN);
            double energy = 0.5 * k * x * x - a.pushForce() * x;
            job = new Arrest(mass, energy > 0 ? Math.sqrt(2 * energy / mass) : 0, a.angle(), a.driveForce(), Double.NaN);
        } else {
            double angle = Math.toRadians(15 + 75 * r.nextDouble());
            double eta = r.nextInt(2) == 0 ? 1 : 1 - 0.3 * r.nextDouble();
            double ma = s.activeMass();
            double lift = 9.80665 * Math.sin(angle);
            double mass = Math.max(1e-3, eta * k * x * (0.05 + 0.45 * r.nextDouble()) / (2 * lift));
            double v2 = (eta * k * x * x - 2 * (mass + ma / 2) * lift * x) / (mass + ma / 3);
            double height = v2 > 0 ? v2 * Math.sin(angle) * Math.sin(angle) / (2 * 9.80665) : 0.01;
            job = new Launch(mass, height, angle, 1 - eta);
        }
        OptionalDouble pocket = arrest && r.nextBoolean() ? OptionalDouble.of(l0 * (0.8 + 0.25 * r.nextDouble()))
                : OptionalDouble.empty();
        Envelope open = new Envelope(OptionalDouble.empty(), OptionalDouble.empty(), Clearance.DEFAULT,
                OptionalDouble.empty(), pocket);
        OptionalDouble cycles = r.nextInt(4) == 0 ? OptionalDouble.of(Math.pow(10, 3 + 5 * r.nextDouble())) : OptionalDouble.empty();
        SpringOptions loose = options(ends, 2, 30, 1, 200, xi, r.nextInt(4) != 0, r.nextBoolean(),
                Seating.values()[r.nextInt(Seating.values().length)], cycles, r.nextBoolean(), 1.0);
        Limits noLimits = new Limits(10, OptionalDouble.empty(), OptionalDouble.empty());
        Evaluation e = DesignEvaluator.evaluate(s, requirement(job, noLimits, open, loose));
        if (pocket.isEmpty() && r.nextInt(3) == 0) { // put the coil-bind margin on its edge
            s = s.withFreeLength(Math.max(ls * 1.001, ls + (1 + xi) * e.totalDeflection() * factor(r, true)));
            e = DesignEvaluator.evaluate(s, requirement(job, noLimits, open, loose));
        }
        boolean edge = r.nextBoolean();
        Clearance cl = r.nextBoolean() ? Clearance.DEFAULT : Clearance.ofLength(1e-3 * r.nextDouble());
        double shareLeft = Double.isNaN(cl.length()) ? 1 - cl.fraction() : 1;
        double gap = Double.isNaN(cl.length()) ? 0 : cl.length();
        OptionalDouble bore = maybe(r, (e.outerDiameterAtSolid() * factor(r, edge) + gap) / shareLeft);
        double rodShare = Double.isNaN(cl.length()) ? 1 + cl.fraction() : 1;
        OptionalDouble rod = maybe(r, (s.innerDiameter() * factor(r, edge) - gap) / rodShare);
        if (rod.isPresent() && (rod.getAsDouble() <= 0 || bore.isPresent() && rod.getAsDouble() >= bore.getAsDouble())) {
            rod = OptionalDouble.empty();
        }
        OptionalDouble maxL0 = maybe(r, s.freeLength() * factor(r, edge));
        if (pocket.isPresent() && maxL0.isPresent() && pocket.getAsDouble() > maxL0.getAsDouble()) {
            maxL0 = OptionalDouble.empty();
        }
        Envelope env = new Envelope(bore, rod, cl, maxL0, pocket);
        double cLow = Math.max(2, Math.min(30, s.index() * factor(r, edge)));
        double nLow = Math.max(1, Math.min(200, na * factor(r, edge)));
        double margin = e.fatigue().isPresent() ? Math.max(0.5, Math.min(5, e.fatigue().get().safetyFactor() * factor(r, edge)))
                : 1.0;
        SpringOptions opt = options(ends, r.nextBoolean() ? cLow : 2, r.nextBoolean() ? 30 : Math.max(cLow, s.index() * factor(r, edge)),
                r.nextBoolean() ? nLow : 1, r.nextBoolean() ? 200 : Math.max(nLow, Math.min(200, na * factor(r, edge))),
                xi, loose.solidSafe(), loose.setRemoved(), loose.seating(), cycles, loose.shotPeened(), margin);
        double stroke = e.workingDeflection() * factor(r, edge);
        OptionalDouble force = maybe(r, e.peakForce() * factor(r, edge));
        OptionalDouble decel = arrest && e.peakDeceleration() > 0 ? maybe(r, e.peakDeceleration() * factor(r, edge))
                : OptionalDouble.empty();
        Limits lim = new Limits(stroke > 0 ? stroke : 1e-3, force, decel);
        return new Case(s, requirement(job, lim, env, opt));
    }

    private static OptionalDouble maybe(Random r, double v) {
        return r.nextInt(3) == 0 && v > 0 ? OptionalDouble.of(v) : OptionalDouble.empty();
    }

    private static SpringOptions options(EndType ends, double cMin, double cMax, double nMin, double nMax, double xi,
                                         boolean solidSafe, boolean setRemoved, Seating seating, OptionalDouble cycles,
                                         boolean peened, double fatigueMargin) {
        return new SpringOptions(List.of(), List.of(ends), cMin, cMax, nMin, nMax, xi, solidSafe, setRemoved, seating,
                Optional.empty(), cycles, peened, fatigueMargin, 2);
    }

    private static Requirement requirement(Job job, Limits lim, Envelope env, SpringOptions opt) {
        return new Requirement("generated", job, lim, env, opt, Ranking.defaults(), UnitSystem.SI, List.of());
    }

    /** A factor on a figure: within a few parts per billion of 1 (on the edge), or within ±30 %. */
    private static double factor(Random r, boolean onEdge) {
        return onEdge ? 1 + (r.nextInt(7) - 3) * 1e-9 : 0.7 + 0.6 * r.nextDouble();
    }
}
