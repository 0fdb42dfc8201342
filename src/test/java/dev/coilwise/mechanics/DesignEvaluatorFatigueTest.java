package dev.coilwise.mechanics;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

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
import org.junit.jupiter.api.Test;

/** How the design evaluation carries the fatigue check (consistency with the evaluation's own figures). */
class DesignEvaluatorFatigueTest {
    private static final Spring SPRING = new Spring(MaterialTable.loadDefault().get("music-wire"), EndType.CLOSED_GROUND,
            2e-3, 16e-3, 10, 60e-3);

    private static Requirement requirement(Job job, OptionalDouble pocket, OptionalDouble cycles, boolean peened) {
        SpringOptions opt = new SpringOptions(List.of(), List.of(EndType.CLOSED_GROUND), 4, 12, 3, 20, 0.15, true,
                false, Seating.FLAT_FLAT, Optional.empty(), cycles, peened, 1.2, 2);
        Envelope env = new Envelope(OptionalDouble.empty(), OptionalDouble.empty(), Clearance.DEFAULT,
                OptionalDouble.empty(), pocket);
        return new Requirement("test", job, new Limits(0.05, OptionalDouble.empty(), OptionalDouble.empty()), env, opt,
                Ranking.defaults(), UnitSystem.SI, List.of());
    }

    private static final Arrest ARREST = new Arrest(0.5, 0.8, Math.PI / 2, 0, Double.NaN);

    @Test
    void noCycleRequirementMeansNoFatigueCheck() {
        Evaluation e = DesignEvaluator.evaluate(SPRING, requirement(ARREST, OptionalDouble.of(55e-3), OptionalDouble.empty(), false));
        assertThat(e.fatigue()).isEmpty();
        assertThat(e.margin("fatigue")).isEmpty();
    }

    @Test
    void fewerThanTenThousandCyclesAreStaticAndAddNoFatigueMargin() {
        Evaluation e = DesignEvaluator.evaluate(SPRING, requirement(ARREST, OptionalDouble.of(55e-3), OptionalDouble.of(9_999), false));
        assertThat(e.fatigue()).isEmpty();
        assertThat(e.margin("fatigue")).isEmpty();
    }

    @Test
    void arrestCyclesFromThePreloadToThePeak() {
        Evaluation e = DesignEvaluator.evaluate(SPRING, requirement(ARREST, OptionalDouble.of(55e-3), OptionalDouble.of(1e6), false));
        FatigueCheck f = e.fatigue().orElseThrow();
        double tauMin = Stress.corrected(e.preloadForce(), 16e-3, 2e-3);
        assertThat(e.preloadForce()).isPositive();
        assertThat(f.stressAmplitude()).isCloseTo((e.stressAtWorking() - tauMin) / 2, within(1e-6));
        assertThat(f.stressMean()).isCloseTo((e.stressAtWorking() + tauMin) / 2, within(1e-6));
        Margin m = e.margin("fatigue").orElseThrow();
        assertThat(m.hard()).isTrue();
        assertThat(m.actual()).isEqualTo(f.safetyFactor());
        assertThat(m.allowed()).isEqualTo(1.2);
    }

    @Test
    void launchCyclesFromFreeLengthToTheCockedForce() {
        Launch launch = new Launch(0.02, 0.5, Math.PI / 2, 0.05);
        Evaluation e = DesignEvaluator.evaluate(SPRING, requirement(launch, OptionalDouble.empty(), OptionalDouble.of(1e7), true));
        FatigueCheck f = e.fatigue().orElseThrow();
        assertThat(f.stressAmplitude()).isCloseTo(e.stressAtWorking() / 2, within(1e-6));
        assertThat(f.stressMean()).isCloseTo(f.stressAmplitude(), within(1e-6));
    }

    @Test
    void aFatigueFailureMakesTheDesignInfeasible() {
        // A high margin demand no spring of this size meets at 10^7 cycles.
        SpringOptions strict = new SpringOptions(List.of(), List.of(EndType.CLOSED_GROUND), 4, 12, 3, 20, 0.15, true,
                false, Seating.FLAT_FLAT, Optional.empty(), OptionalDouble.of(1e7), false, 5.0, 2);
        Requirement base = requirement(ARREST, OptionalDouble.of(55e-3), OptionalDouble.of(1e7), false);
        Requirement req = new Requirement(base.title(), base.job(), base.limits(), base.envelope(), strict,
                base.ranking(), base.units(), base.stock());
        Evaluation e = DesignEvaluator.evaluate(SPRING, req);
        assertThat(e.fatigue().orElseThrow().safetyFactor()).isLessThan(5.0);
        assertThat(e.violations()).extracting(Margin::key).contains("fatigue");
        assertThat(e.feasible()).isFalse();
    }
}
